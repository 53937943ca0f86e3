/** A number as typed on a phone: "2,4" and "2.4" both count; empty or anything else is null. */
export function parseDecimal(text: string): number | null {
  const t = text.trim().replace(',', '.')
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(t)) return null
  const n = Number(t)
  return Number.isFinite(n) ? n : null
}

/** Grams and litres to a sensible number of places: more for small amounts. */
export function formatAmount(value: number): string {
  const places = value >= 100 ? 1 : value >= 1 ? 2 : 3
  return value.toLocaleString('en-GB', { minimumFractionDigits: places, maximumFractionDigits: places })
}

/** 31.5 h as "31 h 30 min"; under an hour as minutes. */
export function formatHours(hours: number): string {
  const minutes = Math.floor(hours * 60)
  const h = Math.floor(minutes / 60)
  const m = minutes % 60
  return h === 0 ? `${m} min` : `${h} h ${m} min`
}

/** Runs a calculation that throws a RangeError on bad inputs; the message is shown instead. */
export function attempt<T>(run: () => T): { value: T; error: null } | { value: null; error: string } {
  try {
    return { value: run(), error: null }
  } catch (error) {
    return { value: null, error: (error as Error).message }
  }
}
