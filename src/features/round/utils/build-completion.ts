import type { RoundTask } from '#shared/schemas/round'
import { MORTALITY_READING, OTHER_CAUSE } from '#shared/schemas/stock'
import type { CompletionPayload } from '../api/completion-api'
import type { Draft } from '../state/drafts'
import { judgeTypedReadings } from '#shared/readings/typed-reading'

export type BuiltCompletion = { ok: true; payload: CompletionPayload } | { ok: false; errors: Record<string, string> }

/** Checks the draft the way the server will, so nothing that would be refused is sent or queued. */
export function buildCompletion(task: RoundTask, draft: Draft, outcome: 'done' | 'skipped'): BuiltCompletion {
  const errors: Record<string, string> = {}
  let readings: Record<string, number> = {}
  const note = draft.note.trim() || undefined
  if (outcome === 'done') {
    const typed = judgeTypedReadings(draft.readings, task.readingSpecs, task.salinitySetpoint)
    for (const spec of task.readingSpecs) {
      if (typed.empty.includes(spec.key)) errors[`readings.${spec.key}`] = `Enter ${spec.name.toLowerCase()}`
      else if (typed.errors[spec.key]) errors[`readings.${spec.key}`] = typed.errors[spec.key]
    }
    readings = typed.values
  } else {
    if (!draft.skipReason) errors.skipReason = 'Choose why it could not be done'
    else if (draft.skipReason === 'other' && !note) errors.note = 'Say why it could not be done'
  }
  const dead = readings[MORTALITY_READING] ?? 0
  const causeText = draft.mortality.causeText.trim()
  if (dead > 0 && draft.mortality.cause === OTHER_CAUSE && !causeText) errors['mortality.causeText'] = 'Say what the cause was'
  if (Object.keys(errors).length) return { ok: false, errors }
  return {
    ok: true,
    payload: {
      completionId: crypto.randomUUID(),
      outcome,
      version: task.version,
      readings,
      skipReason: outcome === 'skipped' ? (draft.skipReason ?? undefined) : undefined,
      note,
      mortality:
        dead > 0
          ? { cause: draft.mortality.cause, causeText: draft.mortality.cause === OTHER_CAUSE ? causeText : undefined, necropsy: draft.mortality.necropsy }
          : undefined,
      // When it was really done, so lateness is right even if the phone sends it an hour later.
      doneAt: new Date().toISOString(),
    },
  }
}

/** The server's field errors ("readings.do_mgL": [...]) in the draft's shape. */
export function draftErrorsFrom(fieldErrors: Record<string, string[]> | undefined, message: string): Record<string, string> {
  const errors: Record<string, string> = Object.fromEntries(Object.entries(fieldErrors ?? {}).map(([k, v]) => [k, v[0]]))
  return { ...errors, form: message }
}
