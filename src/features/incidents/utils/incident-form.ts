import { DateTime } from 'luxon'
import type { z } from 'zod'
import { UpdateIncidentInputSchema, type Incident, type UpdateIncidentInput } from '#shared/schemas/incident'

/** What is typed both when an incident is filed and when its record is filled in; times are the facility's wall time (datetime-local). */
export interface IncidentBasicsValues {
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

/** The whole record as typed. */
export interface IncidentFormValues extends IncidentBasicsValues {
  personIds: string[]
  told: Array<{ who: string; at: string }>
  rootCause: string
  correctiveActions: string
  status: 'open' | 'reported' | 'closed'
}

export const toLocalInput = (iso: string, zone: string) => DateTime.fromISO(iso).setZone(zone).toFormat("yyyy-MM-dd'T'HH:mm")
const fromLocalInput = (local: string, zone: string) => (local ? (DateTime.fromISO(local, { zone }).toUTC().toISO() ?? local) : '')

export function incidentFormValues(i: Incident, zone: string): IncidentFormValues {
  return {
    title: i.title,
    whatHappened: i.whatHappened,
    startedAt: toLocalInput(i.startedAt, zone),
    noticedAt: toLocalInput(i.noticedAt, zone),
    tankIds: i.tankIds.map(String),
    batchIds: i.batchIds.map(String),
    personIds: i.personIds.map(String),
    affected: String(i.affected),
    dead: String(i.dead),
    immediateActions: i.immediateActions,
    told: i.told.map((t) => ({ who: t.who, at: toLocalInput(t.at, zone) })),
    rootCause: i.rootCause,
    correctiveActions: i.correctiveActions,
    status: i.status === 'reported' || i.status === 'closed' ? i.status : 'open',
  }
}

const whole = (text: string) => (text.trim() === '' ? undefined : Number(text.trim()))

/** The basic fields in the server's shape (not yet checked). */
export const basicsInput = (v: IncidentBasicsValues, zone: string) => ({
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

export type IncidentFormCheck = { ok: true; input: UpdateIncidentInput } | { ok: false; errors: Record<string, string> }

/** The form in the server's shape, checked by the server's schema; status is sent only when it moves on. */
export function checkIncidentForm(v: IncidentFormValues, current: Incident['status'], zone: string): IncidentFormCheck {
  const parsed = UpdateIncidentInputSchema.safeParse({
    ...basicsInput(v, zone),
    personIds: v.personIds.map(Number),
    told: v.told.map((t) => ({ who: t.who, at: fromLocalInput(t.at, zone) })),
    rootCause: v.rootCause,
    correctiveActions: v.correctiveActions,
    status: v.status !== current && v.status !== 'open' ? v.status : undefined,
  })
  return parsed.success ? { ok: true, input: parsed.data } : { ok: false, errors: formErrors(parsed.error) }
}

/** The schema's first complaint per field, keyed as the form names it ("told.0.at"). */
export function formErrors(error: z.ZodError): Record<string, string> {
  const errors: Record<string, string> = {}
  for (const issue of error.issues) errors[issue.path.join('.')] ??= issue.code === 'invalid_type' ? 'Required' : issue.message
  return errors
}
