import { z } from 'zod'
import { text } from '#shared/schemas/text'
import { decimalField, wholeField } from './numbers'

export const transportBoxForm = z
  .object({
    box: text().trim().min(1, 'Required').max(40),
    doMgL: decimalField(0, 60, 'mg/L'),
    tempC: decimalField(-2, 45, '°C'),
    pH: decimalField(0, 14),
    receivingTempC: decimalField(-2, 45, '°C'),
    receivingPH: decimalField(0, 14),
  })
  .transform((v) => ({ kind: 'transport_box' as const, ...v }))
export type TransportBoxValues = z.input<typeof transportBoxForm>

export const transportWaterForm = z
  .object({
    alkalinityMgL: decimalField(0, 1000, 'mg/L'),
    pH: decimalField(0, 14),
    tanMgL: decimalField(0, 100, 'mg/L'),
    nitriteMgL: decimalField(0, 100, 'mg/L'),
    tempC: decimalField(-2, 45, '°C'),
    salinity: decimalField(0, 45, 'g/kg'),
  })
  .transform((v) => ({ kind: 'transport_water' as const, ...v }))
export type TransportWaterValues = z.input<typeof transportWaterForm>

export const bathForm = z
  .object({
    product: text().trim().min(1, 'Required').max(120),
    targetMgL: decimalField(0.000001, 10_000, 'mg/L'),
    volumeL: decimalField(0.001, 1_000_000, 'L'),
    purityPct: decimalField(0.1, 100, '%'),
    gramsWeighed: decimalField(0.000001, 1_000_000, 'g'),
    minutes: wholeField(1, 24 * 60, 'min'),
    observations: text().trim().max(2000),
  })
  .transform((v) => ({ kind: 'bath' as const, ...v }))
export type BathValues = z.input<typeof bathForm>

export const noteForm = z.object({ kind: z.enum(['note', 'review']), text: text().trim().min(1, 'Write the note first').max(4000) })
export type NoteValues = z.input<typeof noteForm>
