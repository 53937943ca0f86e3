const litres = new Intl.NumberFormat('en', { maximumFractionDigits: 1 })

export const formatLitres = (value: number) => `${litres.format(value)} L`

export const formatNumber = (value: number, digits = 1) => new Intl.NumberFormat('en', { maximumFractionDigits: digits }).format(value)

/** Lookup by id with a visible fallback, since the server keeps no foreign keys between catalogues. */
export function nameById<T extends { id: number; code: string; name?: string }>(rows: T[]) {
  const map = new Map(rows.map((r) => [r.id, r]))
  return (id: number | null | undefined, fallback = '—') => {
    if (id == null) return fallback
    const row = map.get(id)
    return row ? (row.name ? `${row.name} (${row.code})` : row.code) : `Missing #${id}`
  }
}
