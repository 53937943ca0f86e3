import { DateTime } from 'luxon'
import { FileIncidentInputSchema, type FileIncidentInput } from '#shared/schemas/incident'
import { formErrors, fromLocalInput, whole } from './incident-form'

/** An incident as typed: times in the facility's wall time (datetime-local), numbers as text. */
export interface FileIncidentFormValues {
  title: string
  whatHappened: string
  startedAt: string
  noticedAt: string
  tankIds: string[]
  batchIds: string[]
  affected: string
  dead: string
  immediateActions: string
}

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
  const parsed = FileIncidentInputSchema.safeParse({
    title: v.title,
    whatHappened: v.whatHappened,
    startedAt: fromLocalInput(v.startedAt, zone),
    noticedAt: fromLocalInput(v.noticedAt, zone),
    tankIds: v.tankIds.map(Number),
    batchIds: v.batchIds.map(Number),
    affected: whole(v.affected),
    dead: whole(v.dead),
    immediateActions: v.immediateActions,
  })
  return parsed.success ? { ok: true, input: parsed.data } : { ok: false, errors: formErrors(parsed.error) }
}
