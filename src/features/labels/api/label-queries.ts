import { queryOptions } from '@tanstack/react-query'
import { toDataURL } from 'qrcode'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'

const root = ['labels'] as const

export const LabelTankSchema = z.object({ id: z.number().int(), code: z.string(), name: z.string(), areaId: z.number().int(), kind: z.string(), inUse: z.boolean() })
export type LabelTank = z.infer<typeof LabelTankSchema>
export const LabelAreaSchema = z.object({ id: z.number().int(), code: z.string(), name: z.string(), roundOrder: z.number().int(), quarantine: z.boolean() })
export type LabelArea = z.infer<typeof LabelAreaSchema>

export const labelQueries = {
  tanks: () => queryOptions({ queryKey: [...root, 'tanks'], queryFn: () => apiFetch('/tanks', z.array(LabelTankSchema)) }),
  areas: () => queryOptions({ queryKey: [...root, 'areas'], queryFn: () => apiFetch('/areas', z.array(LabelAreaSchema)) }),
  /** Drawn in the browser; the same address always gives the same picture. */
  qr: (url: string) =>
    queryOptions({
      queryKey: [...root, 'qr', url],
      queryFn: () => toDataURL(url, { errorCorrectionLevel: 'M', margin: 1, width: 360, color: { dark: '#0b1d26', light: '#ffffff' } }),
      staleTime: Infinity,
      gcTime: 10 * 60_000,
    }),
}
