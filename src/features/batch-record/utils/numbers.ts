import { z } from 'zod'
import { text } from '#shared/schemas/text'

/** A number as typed on a phone: "2,4" and "2.4" both count; anything else is not a number. */
export function parseDecimal(text: string): number | null {
  const t = text.trim().replace(',', '.')
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(t)) return null
  const n = Number(t)
  return Number.isFinite(n) ? n : null
}

/** Decimal places as typed, so results can be shown one place finer than the scale reads. */
export const decimalsOf = (text: string) => (text.trim().replace(',', '.').split('.')[1] ?? '').length

/** A required number field of a form whose inputs are strings. */
export const decimalField = (min: number, max: number, unit = '') =>
  text()
    .trim()
    .min(1, 'Required')
    .refine((s) => parseDecimal(s) !== null, 'Enter a number')
    .transform((s) => parseDecimal(s)!)
    .pipe(
      z
        .number()
        .min(min, `At least ${min}${unit ? ` ${unit}` : ''}`)
        .max(max, `At most ${max}${unit ? ` ${unit}` : ''}`),
    )

export const wholeField = (min: number, max: number, unit = '') => decimalField(min, max, unit).pipe(z.number().int('Whole numbers only'))

export const fixed = (value: number, decimals: number) => value.toFixed(decimals)
