import { z } from 'zod'
import { text } from './text'
import { calendarDate } from './calendar'

const code = text()
  .trim()
  .min(1, 'Required')
  .max(40)
  .regex(/^[A-Za-z0-9._-]+$/, 'Use letters, digits, dot, dash or underscore')
const name = text().trim().min(1, 'Required').max(120)
const hhmm = text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')
const isoDate = calendarDate()

// Building a formatter is the check, and costs milliseconds (a phone's first screen checks the
// facility's zone): each zone is checked once per process. Only zones that passed are kept, so
// the memory is bounded by the real zones.
const knownZones = new Set<string>()
export function isValidTimeZone(tz: string) {
  if (knownZones.has(tz)) return true
  try {
    new Intl.DateTimeFormat('en', { timeZone: tz })
    knownZones.add(tz)
    return true
  } catch {
    return false
  }
}

export const FacilitySchema = z.object({
  id: z.number().int(),
  name,
  timeZone: text().refine(isValidTimeZone, 'Unknown IANA time zone'),
  handoverTime: hhmm,
  quarantineDays: z.number().int().min(0).max(365),
  arrivalTempDiffLimitC: z.number().min(0).max(10),
  minOxygenHours: z.number().min(0).max(240),
  /** Ladder for missed routine tasks, and the fast one for welfare-critical tasks and critical readings. */
  defaultLadderId: z.number().int().nullable(),
  fastLadderId: z.number().int().nullable(),
  digestTime: text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour'),
})
export type Facility = z.infer<typeof FacilitySchema>
export const UpdateFacilityInputSchema = FacilitySchema.omit({ id: true }).partial()
export type UpdateFacilityInput = z.infer<typeof UpdateFacilityInputSchema>

export const AreaSchema = z.object({
  id: z.number().int(),
  code,
  name,
  roundOrder: z.number().int().min(0).max(10000),
  quarantine: z.boolean(),
})
export type Area = z.infer<typeof AreaSchema>
export const AreaInputSchema = AreaSchema.omit({ id: true })
export type AreaInput = z.infer<typeof AreaInputSchema>

export const SystemSchema = z.object({
  id: z.number().int(),
  code,
  name,
  areaId: z.number().int().nullable(),
  volumeL: z.number().positive().max(1e8),
  salinitySetpoint: z.number().min(0).max(45).nullable(),
})
export type System = z.infer<typeof SystemSchema>
export const SystemInputSchema = SystemSchema.omit({ id: true })
export type SystemInput = z.infer<typeof SystemInputSchema>

export const TANK_KINDS = ['tank', 'bin'] as const
export const TankSchema = z.object({
  id: z.number().int(),
  code,
  name,
  areaId: z.number().int(),
  systemId: z.number().int().nullable(),
  volumeL: z.number().positive().max(1e7),
  kind: z.enum(TANK_KINDS),
  inUse: z.boolean(),
})
export type Tank = z.infer<typeof TankSchema>
export const TankInputSchema = TankSchema.omit({ id: true })
export type TankInput = z.infer<typeof TankInputSchema>

export const EquipmentSchema = z.object({
  id: z.number().int(),
  code,
  name,
  kind: text().trim().min(1, 'Required').max(60),
  areaId: z.number().int().nullable(),
})
export type Equipment = z.infer<typeof EquipmentSchema>
export const EquipmentInputSchema = EquipmentSchema.omit({ id: true })
export type EquipmentInput = z.infer<typeof EquipmentInputSchema>

export const BATCH_STATUSES = ['quarantine', 'active', 'dispatched', 'ended'] as const
export const BatchSchema = z.object({
  id: z.number().int(),
  code,
  species: text().trim().min(1, 'Required').max(120),
  origin: text().trim().max(200),
  arrivalDate: isoDate,
  count: z.number().int().min(0).max(10_000_000),
  meanWeightG: z.number().min(0).max(100_000),
  tankIds: z.array(z.number().int()),
  status: z.enum(BATCH_STATUSES),
  /** Feeding rate, % of body weight per day, for the batch's daily ration. */
  feedRatePct: z.number().min(0).max(30).nullable().default(null),
})
export type Batch = z.infer<typeof BatchSchema>
export const BatchInputSchema = BatchSchema.omit({ id: true })
export type BatchInput = z.infer<typeof BatchInputSchema>

export const IdParamSchema = z.object({ id: z.coerce.number().int().positive() })

export const TankImportResultSchema = z.object({
  created: z.number().int(),
  updated: z.number().int(),
  unchanged: z.number().int(),
})
export type TankImportResult = z.infer<typeof TankImportResultSchema>
