import { judgeTypedReadings } from '#shared/readings/typed-reading'
import type { RoundTask } from '#shared/schemas/round'
import { ApiError } from '../../../lib/api-client'
import { clockTime, paperTime } from './sheet-format'

export interface PaperDraft {
  values: Record<string, string>
  time: string
  personId: number | null
}

export type PaperCheck = { ok: true; readings: Record<string, number>; doneAt: string; personId: number } | { ok: false; errors: Record<string, string> }

/** What was copied from paper, checked before it is sent: every reading a possible number, a time, a person. */
export function checkPaperDraft(task: RoundTask, draft: PaperDraft, date: string, timeZone: string): PaperCheck {
  const errors: Record<string, string> = {}
  const typed = judgeTypedReadings(draft.values, task.readingSpecs, task.salinitySetpoint)
  for (const spec of task.readingSpecs) {
    if (typed.empty.includes(spec.key)) errors[spec.key] = 'Copy this reading from the sheet'
    else if (typed.errors[spec.key]) errors[spec.key] = typed.errors[spec.key]
  }
  const readings = typed.values
  const doneAt = paperTime(date, draft.time, timeZone)
  if (!doneAt) errors.time = 'Use the time on the sheet, HH:MM'
  else if (Date.parse(doneAt) > Date.now() + 60_000) errors.time = 'That time has not come yet'
  if (draft.personId === null) errors.person = 'Choose who did it'
  if (Object.keys(errors).length || !doneAt || draft.personId === null) return { ok: false, errors }
  return { ok: true, readings, doneAt, personId: draft.personId }
}

/** The server names reading errors "readings.<key>"; the form names them by key. */
export function serverFieldErrors(fieldErrors: Record<string, string[]> | undefined): Record<string, string> {
  const out: Record<string, string> = {}
  for (const [field, messages] of Object.entries(fieldErrors ?? {})) {
    const key = field.startsWith('readings.') ? field.slice('readings.'.length) : field === 'doneAt' ? 'time' : field === 'performedById' ? 'person' : field
    out[key] = messages[0]
  }
  return out
}

/** The server's refusal in the sheet's words; a task finished meanwhile names who and when in the facility's time. */
export function refusal(error: Error, timeZone: string): string {
  const details = error instanceof ApiError ? error.details : undefined
  if (error instanceof ApiError && error.status === 409 && typeof details?.completedByName === 'string' && typeof details.completedAt === 'string') {
    return `already done in Roundtide by ${details.completedByName} at ${clockTime(details.completedAt, timeZone)}.`
  }
  return error.message
}
