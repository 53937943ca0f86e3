import { IANAZone } from 'luxon'

/** A wall-clock reading (calendar fields) that belongs to no zone until one is chosen. */
export type WallTime = {
  year: number
  month: number
  day: number
  hour: number
  minute: number
  second: number
}

export const DAY_MS = 86_400_000
const MINUTE_MS = 60_000
const LOCAL_WALL_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})$/

export function resolveZone(tzid: string): IANAZone {
  if (!IANAZone.isValidZone(tzid)) throw new Error(`Unknown time zone "${tzid}"`)
  return IANAZone.create(tzid)
}

/**
 * "Floating" milliseconds: the wall time written as if it were UTC. The Date built from it
 * reads back the same wall time through its getUTC* methods under any process TZ.
 */
export function wallToFloatingMs(wall: WallTime): number {
  const date = new Date(0)
  // setUTCFullYear keeps years 0-99 literal, unlike Date.UTC
  date.setUTCFullYear(wall.year, wall.month - 1, wall.day)
  date.setUTCHours(wall.hour, wall.minute, wall.second, 0)
  return date.getTime()
}

export function floatingMsToWall(floatingMs: number): WallTime {
  const date = new Date(floatingMs)
  return {
    year: date.getUTCFullYear(),
    month: date.getUTCMonth() + 1,
    day: date.getUTCDate(),
    hour: date.getUTCHours(),
    minute: date.getUTCMinutes(),
    second: date.getUTCSeconds(),
  }
}

const pad = (value: number, width = 2) => String(value).padStart(width, '0')

export function formatWallTime(wall: WallTime): string {
  const date = `${pad(wall.year, 4)}-${pad(wall.month)}-${pad(wall.day)}`
  return `${date}T${pad(wall.hour)}:${pad(wall.minute)}:${pad(wall.second)}`
}

export function formatUtcInstant(instantMs: number): string {
  return `${formatWallTime(floatingMsToWall(instantMs))}Z`
}

export function parseWallTime(text: string, label: string): WallTime {
  const match = LOCAL_WALL_TIME.exec(text)
  if (!match) {
    throw new Error(`Invalid ${label} "${text}": expected local time as YYYY-MM-DDTHH:mm:ss`)
  }
  const [year, month, day, hour, minute, second] = match.slice(1).map(Number)
  const wall = { year, month, day, hour, minute, second }
  // Date arithmetic rolls 2025-02-30 over to March, so a changed read-back means no such date
  if (formatWallTime(floatingMsToWall(wallToFloatingMs(wall))) !== text) {
    throw new Error(`Invalid ${label} "${text}": no such calendar date or time`)
  }
  return wall
}

const QUARTER_MS = 15 * MINUTE_MS
type ZoneOffsets = { days: Map<number, number | null>; quarters: Map<number, number | null> }
const offsetsByZone = new Map<string, ZoneOffsets>()

/** The offset throughout one span of a bucket size, or null when its two ends differ. */
function steadyOffset(zone: IANAZone, cache: Map<number, number | null>, size: number, instantMs: number): number | null {
  const bucket = Math.floor(instantMs / size)
  let known = cache.get(bucket)
  if (known === undefined) {
    const first = zone.offset(bucket * size)
    known = first === zone.offset((bucket + 1) * size - 1) ? first : null
    if (cache.size >= 100_000) cache.clear()
    cache.set(bucket, known)
  }
  return known
}

/**
 * The zone's UTC offset in minutes at an instant. Luxon asks Intl on every call (about 10 µs),
 * and a dense rule's occurrences ask thousands of times, so offsets are kept per UTC day: a day
 * whose two ends share an offset has it throughout, since no zone changes and changes back
 * within a day (the closest two transitions in the time-zone database since 1970 are seven days
 * apart, by `zdump -v` over every zone). A day holding a transition is kept per quarter hour (no
 * zone changes twice within 15 minutes), and a quarter holding one is asked exactly.
 */
function offsetAt(zone: IANAZone, instantMs: number): number {
  let offsets = offsetsByZone.get(zone.name)
  if (!offsets) offsetsByZone.set(zone.name, (offsets = { days: new Map(), quarters: new Map() }))
  return steadyOffset(zone, offsets.days, DAY_MS, instantMs) ?? steadyOffset(zone, offsets.quarters, QUARTER_MS, instantMs) ?? zone.offset(instantMs)
}

/**
 * How far the zone's offset moves between a day before and a day after this wall time, in ms
 * (0 where it keeps one offset). Only across a gap can a later wall time map to an earlier
 * instant (a time in the gap is moved forward by it), and never by more than this.
 */
export function offsetSpreadMs(zone: IANAZone, floatingMs: number): number {
  const offsets = [offsetAt(zone, floatingMs - DAY_MS), offsetAt(zone, floatingMs), offsetAt(zone, floatingMs + DAY_MS)]
  return (Math.max(...offsets) - Math.min(...offsets)) * MINUTE_MS
}

export function instantToFloatingMs(instantMs: number, zone: IANAZone): number {
  return instantMs + offsetAt(zone, instantMs) * MINUTE_MS
}

/**
 * Places a wall time in a zone following RFC 5545 §3.3.5: a time that occurs twice
 * (clocks go back) means its first occurrence; a time that does not occur (clocks go
 * forward) is read with the offset in force before the gap, which moves it forward by
 * the length of the gap. Luxon's own guess picks the later instant in some zones, so
 * the candidates are checked here explicitly.
 */
export function floatingMsToInstant(floatingMs: number, zone: IANAZone): number {
  const offsetBefore = offsetAt(zone, floatingMs - DAY_MS)
  const nearbyOffsets = new Set([offsetBefore, offsetAt(zone, floatingMs), offsetAt(zone, floatingMs + DAY_MS)])
  const matchingInstants = [...nearbyOffsets]
    .map((offset) => floatingMs - offset * MINUTE_MS)
    .filter((instant) => instantToFloatingMs(instant, zone) === floatingMs)
  if (matchingInstants.length > 0) return Math.min(...matchingInstants)
  return floatingMs - offsetBefore * MINUTE_MS
}
