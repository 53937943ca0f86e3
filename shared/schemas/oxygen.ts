import { z } from 'zod'
import { text } from './text'

export const CylinderInputSchema = z
  .object({
    code: text().trim().min(1, 'Required').max(40),
    label: text().trim().min(1, 'Required').max(160),
    method: z.enum(['metric', 'psi-factor']),
    waterCapacityL: z.number().positive().max(10_000).nullable().default(null),
    factorLPerPsi: z.number().positive().max(100).nullable().default(null),
    compressibility: z.number().min(0.5).max(1.5).nullable().default(null),
    reservePressure: z.number().min(0).max(5000),
    flowLPerMin: z.number().min(0).max(1000).default(0),
  })
  .superRefine((c, ctx) => {
    if (c.method === 'metric' && !c.waterCapacityL) ctx.addIssue({ code: 'custom', path: ['waterCapacityL'], message: 'Give the water capacity in litres' })
    if (c.method === 'psi-factor' && !c.factorLPerPsi)
      ctx.addIssue({ code: 'custom', path: ['factorLPerPsi'], message: 'Give the cylinder factor (L per psi)' })
  })
export type CylinderInput = z.input<typeof CylinderInputSchema>
export type ParsedCylinderInput = z.output<typeof CylinderInputSchema>

export const CylinderReadingInputSchema = z.object({
  pressure: z.number().min(0, 'Pressure cannot be negative').max(5000),
  flowLPerMin: z.number().positive('Flow must be above 0').max(1000),
})
export type CylinderReadingInput = z.infer<typeof CylinderReadingInputSchema>

export const CylinderStatusSchema = z.object({
  id: z.number().int(),
  code: text(),
  label: text(),
  method: z.enum(['metric', 'psi-factor']),
  unit: z.enum(['bar', 'psi']),
  reservePressure: z.number(),
  lastPressure: z.number().nullable(),
  flowLPerMin: z.number(),
  lastReadAt: text().nullable(),
  gasLeftL: z.number().nullable(),
  hoursToReserve: z.number().nullable(),
  level: z.enum(['ok', 'low', 'critical', 'unknown']),
  replaceTaskId: z.number().int().nullable(),
})
export type CylinderStatus = z.infer<typeof CylinderStatusSchema>
