import { DateTime } from 'luxon'
import { FileIncidentInputSchema, type FileIncidentInput } from '#shared/schemas/incident'
import { basicsInput, formErrors, type IncidentBasicsValues } from './incident-form'

export type FileIncidentFormValues = IncidentBasicsValues

/** A blank form, noticed now (the usual case: filed as soon as it is seen). */
export function emptyFileIncidentForm(zone: string, now = new Date()): FileIncidentFormValues {
  return {
    title: '',
    whatHappened: '',
    startedAt: '',
    noticedAt: DateTime.fromJSDate(now).setZone(zone).toFormat("yyyy-MM-dd'T'HH:mm"),
    tankIds: [],
    batchIds: [],
    affected: '0',
    dead: '0',
    immediateActions: '',
  }
}

export type FileIncidentCheck = { ok: true; input: FileIncidentInput } | { ok: false; errors: Record<string, string> }

/** The form in the server's shape, checked by the server's own schema before it is sent. */
export function checkFileIncidentForm(v: FileIncidentFormValues, zone: string): FileIncidentCheck {
  const parsed = FileIncidentInputSchema.safeParse(basicsInput(v, zone))
  return parsed.success ? { ok: true, input: parsed.data } : { ok: false, errors: formErrors(parsed.error) }
}
