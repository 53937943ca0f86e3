import type { Reading } from '../schemas/completion'
import type { Band } from '../schemas/parameter'
import { bandFor, worstBand, type Bounds } from './band'
import { deriveReadings } from './derive'

/** What a reading may physically be: the one range every check of a typed value uses. */
export interface PhysicalRange {
  unit: string
  physicalMin: number
  physicalMax: number
}

/** Why a value cannot be a real reading of this parameter ("Not possible: must be 0–30 °C"), or null. */
export function impossibleReading(value: number, range: PhysicalRange): string | null {
  if (value >= range.physicalMin && value <= range.physicalMax) return null
  return `Not possible: must be ${range.physicalMin}–${range.physicalMax}${range.unit ? ` ${range.unit}` : ''}`
}

/** What one reading is judged by: its physical range and the limits that apply where it was taken. */
export interface ReadingRule extends Bounds, PhysicalRange {
  name: string
  /** Worked out by Roundtide from other readings, never typed in. */
  derived?: boolean
}

export type ReadingProblemKind = 'missing' | 'unknown' | 'derived' | 'impossible'

export interface ReadingProblem {
  kind: ReadingProblemKind
  /** Names the reading, for a message read away from its field ("pH 15 pH is impossible (must be 0–14)"). */
  message: string
  /** Read beside the field that already names the reading ("Not possible: must be 0–14 pH"). */
  hint: string
}

export interface ReadingJudgement {
  /** Typed and derived readings, each banded against its limits; empty when there are problems. */
  readings: Reading[]
  /** The worst band of all readings: ok (normal), watch (warning) or critical. */
  flag: Band
  /** Why a derived value could not be worked out. */
  notes: string[]
  /** By reading key; nothing may be stored while there is one. */
  problems: Record<string, ReadingProblem>
}

export interface JudgeOptions {
  /** Readings the task asks for; a missing one is a problem. */
  required?: readonly string[]
  salinitySetpoint?: number | null
}

function problemOf(key: string, value: number | undefined, rule: ReadingRule | undefined): ReadingProblem | null {
  if (value === undefined) return { kind: 'missing', message: `${rule?.name ?? key} is required`, hint: 'Required' }
  if (!rule) return { kind: 'unknown', message: 'Unknown reading', hint: 'Unknown reading' }
  if (rule.derived) return { kind: 'derived', message: `${rule.name} is worked out by Roundtide, not typed in`, hint: 'Worked out by Roundtide, not typed in' }
  const impossible = impossibleReading(value, rule)
  if (!impossible) return null
  return { kind: 'impossible', message: `${rule.name} ${value} ${rule.unit} is impossible (must be ${rule.physicalMin}–${rule.physicalMax})`, hint: impossible }
}

/**
 * The one judgement of a set of typed readings, made the same way by the server (completion and
 * amendment) and the client (the round and the paper sheet) before it sends: every required
 * reading present, each typed one known, typed-in and physically possible; derived values worked
 * out; each reading banded against the rule for its place; the flag is the worst band.
 */
export function judgeReadings(values: Record<string, number>, ruleFor: (key: string) => ReadingRule | undefined, options: JudgeOptions = {}): ReadingJudgement {
  const problems: Record<string, ReadingProblem> = {}
  for (const key of options.required ?? []) {
    if (values[key] === undefined) problems[key] = problemOf(key, undefined, ruleFor(key))!
  }
  for (const [key, value] of Object.entries(values)) {
    const problem = problemOf(key, value, ruleFor(key))
    if (problem) problems[key] = problem
  }
  if (Object.keys(problems).length) return { readings: [], flag: 'ok', notes: [], problems }
  const derived = deriveReadings(values, options.salinitySetpoint ?? null)
  const entries = [...Object.entries(values).map(([k, v]) => [k, v, false] as const), ...Object.entries(derived.values).map(([k, v]) => [k, v, true] as const)]
  const readings = entries.map(([parameterKey, value, isDerived]) => {
    const rule = ruleFor(parameterKey)
    return { parameterKey, value, unit: rule?.unit ?? '', band: bandFor(value, rule), derived: isDerived }
  })
  return { readings, flag: worstBand(readings.map((r) => r.band)), notes: derived.notes, problems }
}
