import { decimalsOf, parseDecimal } from './numbers'

export type WeightEntry = { id: number; grams: number; decimals: number }

// The record's own limits (shared/schemas/batch-record.ts): above 0, at most 100 kg, 500 fish.
export const MAX_WEIGHT_G = 100_000
export const MAX_FISH = 500

/** A typed weight, or the reason it cannot be added. */
export function readWeight(text: string): { grams: number; decimals: number } | { error: string } {
  const grams = parseDecimal(text)
  if (grams === null) return { error: 'Type a weight in grams, e.g. 2.4' }
  if (grams <= 0) return { error: 'A weight must be above 0 g' }
  if (grams > MAX_WEIGHT_G) return { error: `At most ${MAX_WEIGHT_G} g per fish` }
  return { grams, decimals: decimalsOf(text) }
}

/** Results one place finer than the finest weight typed, between 2 and 4 places. */
export const statDecimals = (entries: WeightEntry[]) => Math.min(4, Math.max(2, ...entries.map((e) => e.decimals + 1)))
