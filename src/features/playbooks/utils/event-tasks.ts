import { DateTime } from 'luxon'
import { stepOccurrences } from '#shared/playbooks/step-times'
import type { FacilityEvent, Playbook } from '#shared/schemas/playbook'
import type { Task } from '#shared/schemas/task'
import { addDays } from './zone-format'

// The task list answers at most 62 days per request.
const CHUNK_DAYS = 60

/** Date windows covering the event's steps and its fasting window, in facility dates. */
export function eventTaskWindows(event: FacilityEvent, playbook: Playbook, zone: string): Array<{ from: string; to: string }> {
  const dates = playbook.steps.flatMap((s) => stepOccurrences(s, event.localStart, zone).map((o) => o.local.slice(0, 10)))
  if (event.fastingFrom) dates.push(DateTime.fromISO(event.fastingFrom).setZone(zone).toISODate()!)
  dates.push(event.localStart.slice(0, 10))
  dates.sort()
  const windows = []
  for (let from = dates[0]; from <= dates[dates.length - 1]; from = addDays(from, CHUNK_DAYS + 1)) {
    const end = addDays(from, CHUNK_DAYS)
    windows.push({ from, to: end < dates[dates.length - 1] ? end : dates[dates.length - 1] })
  }
  return windows
}

/**
 * Tasks carry no event id on the wire yet, so the event's own are recognised by the title the
 * server gives them ("<step> · <event>") and the feeds it holds by their reason.
 */
export function belongsToEvent(task: Task, event: FacilityEvent, playbook: Playbook): boolean {
  if (task.routineId !== null && task.status !== 'held') return false
  if (task.tankId !== null && !event.tankIds.includes(task.tankId)) return false
  const titles = new Set(playbook.steps.map((s) => `${s.title} · ${event.title}`.slice(0, 160)))
  return (task.routineId === null && titles.has(task.title)) || task.heldReason === `Fasting before ${event.title}`.slice(0, 300)
}
