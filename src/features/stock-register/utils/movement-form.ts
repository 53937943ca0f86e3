import { DateTime } from 'luxon'
import { MovementInputSchema, type MovementKind, type ParsedMovementInput } from '#shared/schemas/stock'

/** Every field of every kind as typed (strings); the chosen kind decides which are sent. */
export interface MovementFormValues {
  kind: MovementKind
  batchId: string
  fromTankId: string
  toTankId: string
  tankId: string
  count: string
  delta: string
  meanWeightG: string
  origin: string
  permitRef: string
  healthCertificateRef: string
  transportWater: { tempC: string; pH: string; doMgL: string }
  cause: string
  causeText: string
  necropsy: boolean
  reason: string
  destination: string
  correctsId: string
  occurredAt: string
  note: string
}

export const emptyMovementForm = (start: Partial<MovementFormValues> = {}): MovementFormValues => ({
  kind: 'mortality',
  batchId: '',
  fromTankId: '',
  toTankId: '',
  tankId: '',
  count: '',
  delta: '',
  meanWeightG: '',
  origin: '',
  permitRef: '',
  healthCertificateRef: '',
  transportWater: { tempC: '', pH: '', doMgL: '' },
  cause: 'unknown',
  causeText: '',
  necropsy: false,
  reason: '',
  destination: '',
  correctsId: '',
  occurredAt: '',
  note: '',
  ...start,
})

/** "2,4" and "2.4" are both numbers; an empty field is left out (and the schema says it is needed, when it is). */
const num = (text: string) => {
  const t = text.trim().replace(',', '.')
  return t === '' ? undefined : Number(t)
}
const optional = (text: string) => (text.trim() === '' ? undefined : text)
const nullable = (text: string) => num(text) ?? null

/** The values the chosen kind needs, in the shape the server reads; wall time is the facility's. */
export function movementInputFrom(v: MovementFormValues, timeZone: string): Record<string, unknown> {
  const common = {
    kind: v.kind,
    batchId: num(v.batchId),
    note: optional(v.note),
    occurredAt: v.occurredAt ? (DateTime.fromISO(v.occurredAt, { zone: timeZone }).toISO() ?? v.occurredAt) : undefined,
  }
  const moved = { fromTankId: num(v.fromTankId), count: num(v.count) }
  switch (v.kind) {
    case 'arrival': {
      const water = { tempC: nullable(v.transportWater.tempC), pH: nullable(v.transportWater.pH), doMgL: nullable(v.transportWater.doMgL) }
      const anyWater = Object.values(water).some((w) => w !== null)
      return {
        ...common,
        toTankId: num(v.toTankId),
        count: num(v.count),
        meanWeightG: num(v.meanWeightG),
        origin: v.origin,
        permitRef: optional(v.permitRef),
        healthCertificateRef: optional(v.healthCertificateRef),
        transportWater: anyWater ? water : undefined,
      }
    }
    case 'transfer':
    case 'grading':
      return { ...common, ...moved, toTankId: num(v.toTankId), meanWeightG: num(v.meanWeightG) }
    case 'mortality':
      return { ...common, ...moved, cause: v.cause, causeText: optional(v.causeText), necropsy: v.necropsy }
    case 'cull':
    case 'sampling':
      return { ...common, ...moved, reason: v.reason }
    case 'dispatch':
      return { ...common, ...moved, destination: v.destination }
    case 'correction':
      return { ...common, tankId: num(v.tankId), delta: num(v.delta), reason: v.reason, correctsId: num(v.correctsId) }
  }
}

const CHOICES = new Set(['batchId', 'fromTankId', 'toTankId', 'tankId'])

export type MovementFormCheck = { ok: true; input: ParsedMovementInput } | { ok: false; errors: Record<string, string> }

/** Checks the form with the server's own schema, so the field messages are the ones the server would give. */
export function checkMovementForm(v: MovementFormValues, timeZone: string): MovementFormCheck {
  const parsed = MovementInputSchema.safeParse(movementInputFrom(v, timeZone))
  if (parsed.success) return { ok: true, input: parsed.data }
  const errors: Record<string, string> = {}
  for (const issue of parsed.error.issues) {
    const key = issue.path.join('.') || 'kind'
    const unchosen = CHOICES.has(key) && issue.code === 'invalid_type'
    errors[key] ??= unchosen ? 'Choose one' : issue.message
  }
  return { ok: false, errors }
}
