import { z } from 'zod'
import { text } from './text'

export const BANDS = ['ok', 'watch', 'critical'] as const
export const BandSchema = z.enum(BANDS)
export type Band = z.infer<typeof BandSchema>

export const ParameterSchema = z.object({
  id: z.number().int(),
  key: text(),
  name: text(),
  unit: text(),
  decimals: z.number().int().min(0).max(4),
  /** A value outside the physical range is an input error, not a reading. */
  physicalMin: z.number(),
  physicalMax: z.number(),
  derived: z.boolean(),
  /** The ladder a critical reading of this parameter climbs; the facility's fast ladder when empty. */
  ladderId: z.number().int().nullable(),
})
export type Parameter = z.infer<typeof ParameterSchema>

export const LIMIT_SCOPES = ['facility', 'system', 'batch'] as const
const bound = z.number().finite().nullable()

export const LimitSchema = z.object({
  id: z.number().int(),
  parameterKey: text(),
  scope: z.enum(LIMIT_SCOPES),
  scopeId: z.number().int().nullable(),
  okMin: bound,
  okMax: bound,
  criticalMin: bound,
  criticalMax: bound,
})
export type Limit = z.infer<typeof LimitSchema>

export const LimitInputSchema = LimitSchema.omit({ id: true }).superRefine((l, ctx) => {
  if (l.scope !== 'facility' && l.scopeId == null) ctx.addIssue({ code: 'custom', path: ['scopeId'], message: `Choose the ${l.scope}` })
  if (l.okMin != null && l.okMax != null && l.okMin > l.okMax)
    ctx.addIssue({ code: 'custom', path: ['okMax'], message: 'The upper ok limit is below the lower one' })
  if (l.criticalMin != null && l.okMin != null && l.criticalMin > l.okMin)
    ctx.addIssue({ code: 'custom', path: ['criticalMin'], message: 'The critical low limit must be at or below the ok range' })
  if (l.criticalMax != null && l.okMax != null && l.criticalMax < l.okMax)
    ctx.addIssue({ code: 'custom', path: ['criticalMax'], message: 'The critical high limit must be at or above the ok range' })
})
export type LimitInput = z.infer<typeof LimitInputSchema>
