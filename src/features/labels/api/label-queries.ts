import { queryOptions } from '@tanstack/react-query'
import { toDataURL } from 'qrcode'

const root = ['labels'] as const

export const labelQueries = {
  /** Drawn in the browser; the same address always gives the same picture. */
  qr: (url: string) =>
    queryOptions({
      queryKey: [...root, 'qr', url],
      queryFn: () => toDataURL(url, { errorCorrectionLevel: 'M', margin: 1, width: 360, color: { dark: '#0b1d26', light: '#ffffff' } }),
      staleTime: Infinity,
      gcTime: 10 * 60_000,
    }),
}
