import { formatWhen } from '../../../lib/zone-format'

/** An instant as facility wall time: "Wed 3 Dec, 09:00". */
export const formatInstant = (iso: string, zone: string) => formatWhen(iso, zone)

/** 31.5 h as "31 h 30 min"; whole days beyond two days. */
export function formatHours(hours: number): string {
  if (hours >= 48) return `${Math.floor(hours / 24)} d ${Math.floor(hours % 24)} h`
  const minutes = Math.floor(hours * 60)
  const h = Math.floor(minutes / 60)
  return h === 0 ? `${minutes % 60} min` : `${h} h ${minutes % 60} min`
}

export function parseDecimal(text: string): number | null {
  const t = text.trim().replace(',', '.')
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(t)) return null
  return Number(t)
}
