import type { Band } from '../schemas/parameter'
import type { Bounds } from './band'
import { judgeReadings, type PhysicalRange, type ReadingJudgement, type ReadingRule } from './judge-readings'

export type TypedNumber = { state: 'empty' } | { state: 'invalid'; message: string } | { state: 'number'; value: number }

/** A plain decimal number as a person types it (a decimal comma is fine); nothing else. */
export function parseTypedNumber(raw: string): TypedNumber {
  const text = raw.trim().replace(',', '.')
  if (text === '') return { state: 'empty' }
  const value = Number(text)
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(text) || !Number.isFinite(value)) return { state: 'invalid', message: 'Enter a number' }
  return { state: 'number', value }
}

export interface TypedReadings {
  /** The numbers typed, by reading key. */
  values: Record<string, number>
  /** Fields left empty, in the order of the specs. */
  empty: string[]
  /** Why a field cannot be sent, by reading key, in words to show beside it. */
  errors: Record<string, string>
  judgement: ReadingJudgement
}

/**
 * A form's readings (the round's, the paper sheet's) judged before they are sent, by the same
 * judgement the server makes on completion and amendment: each field a number, then the set
 * judged against each reading's physical range and limits. Empty fields are for the form to word.
 */
export function judgeTypedReadings(
  raw: Record<string, string>,
  specs: ReadonlyArray<ReadingRule & { key: string }>,
  salinitySetpoint: number | null = null,
): TypedReadings {
  const values: Record<string, number> = {}
  const empty: string[] = []
  const errors: Record<string, string> = {}
  for (const spec of specs) {
    const typed = parseTypedNumber(raw[spec.key] ?? '')
    if (typed.state === 'empty') empty.push(spec.key)
    else if (typed.state === 'invalid') errors[spec.key] = typed.message
    else values[spec.key] = typed.value
  }
  const bySpec = new Map(specs.map((s) => [s.key, s]))
  const judgement = judgeReadings(values, (key) => bySpec.get(key), { salinitySetpoint })
  for (const [key, problem] of Object.entries(judgement.problems)) errors[key] = problem.hint
  return { values, empty, errors, judgement }
}

export type ReadingCheck = { state: 'empty' } | { state: 'invalid'; message: string } | { state: 'valid'; value: number; band: Band }

/** One field as the person types it: the same judgement, for the band and message beside the field. */
export function checkTypedReading(raw: string, spec: PhysicalRange & Bounds & { name?: string }): ReadingCheck {
  const typed = judgeTypedReadings({ reading: raw }, [{ ...spec, key: 'reading', name: spec.name ?? 'Reading' }])
  if (typed.empty.length) return { state: 'empty' }
  if (typed.errors.reading) return { state: 'invalid', message: typed.errors.reading }
  return { state: 'valid', value: typed.values.reading, band: typed.judgement.readings[0].band }
}
