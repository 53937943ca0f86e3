/**
 * Daily feed ration from stock numbers, and its split across the day's feeding tasks.
 *
 *   biomass (kg)       = count × mean weight (g) / 1000
 *   daily ration (g)   = biomass (kg) × 1000 × rate (% body weight per day) / 100
 *   per feed (g)       = daily ration / number of feeds
 * (definitions; the feeding rate itself comes from the facility's feeding table or protocol)
 *
 * Rounding: the daily ration is rounded once, to the scale's resolution (default 0.1 g), and that
 * rounded total is shared out in whole steps of the resolution. Feeds differ by at most one step, the
 * earlier feeds of the day take any extra step, and the feeds add back to exactly the rounded total —
 * no gram appears or disappears through per-feed rounding.
 */

export type RationInput = {
  count: number
  meanWeightG: number
  /** Feeding rate, % of body weight per day (3 means 3 %). */
  ratePercentPerDay: number
  /** Feeding tasks scheduled for the day. */
  feeds: number
  /** Decimal places the scale reads: 0 → 1 g, 1 → 0.1 g, 2 → 0.01 g. */
  scaleDecimals?: number
}

export type RationPlan = {
  biomassKg: number
  /** Unrounded daily ration. */
  exactDailyG: number
  /** Daily ration rounded to the scale; `perFeedG` adds back to it exactly, counted in scale steps. */
  dailyG: number
  perFeedG: number[]
}

const DEFAULT_SCALE_DECIMALS = 1

function requirePositive(value: number, name: string): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be above 0, got ${value}`)
}

function requireWholeNumber(value: number, name: string, minimum: number): void {
  if (!Number.isInteger(value) || value < minimum) {
    throw new RangeError(`${name} must be a whole number of at least ${minimum}, got ${value}`)
  }
}

/** Biomass in kg from a head count and mean weight in grams. */
export function biomassKg(count: number, meanWeightG: number): number {
  requireWholeNumber(count, 'Fish count', 1)
  requirePositive(meanWeightG, 'Mean weight (g)')
  return (count * meanWeightG) / 1000
}

/** Daily ration in grams for a biomass (kg) at a rate in % body weight per day. */
export function dailyRationG(biomass: number, ratePercentPerDay: number): number {
  requirePositive(biomass, 'Biomass (kg)')
  requirePositive(ratePercentPerDay, 'Feeding rate (% body weight/day)')
  return (biomass * 1000 * ratePercentPerDay) / 100
}

/**
 * Splits a daily amount into `feeds` portions on a scale with `scaleDecimals` places. Works in whole
 * scale steps (integers), so the portions add back exactly to the rounded daily total.
 */
export function splitDailyRation(dailyG: number, feeds: number, scaleDecimals = DEFAULT_SCALE_DECIMALS): { dailyG: number; perFeedG: number[] } {
  if (!Number.isFinite(dailyG) || dailyG < 0) throw new RangeError(`Daily ration must be 0 g or more, got ${dailyG}`)
  requireWholeNumber(feeds, 'Number of feeds', 1)
  requireWholeNumber(scaleDecimals, 'Scale decimals', 0)
  const stepsPerGram = 10 ** scaleDecimals
  const totalSteps = Math.round(dailyG * stepsPerGram)
  const baseSteps = Math.floor(totalSteps / feeds)
  const feedsWithExtraStep = totalSteps - baseSteps * feeds
  // Dividing a whole number of steps by a power of ten gives the nearest double to the printed grams.
  const perFeedG = Array.from({ length: feeds }, (_, index) => (index < feedsWithExtraStep ? (baseSteps + 1) / stepsPerGram : baseSteps / stepsPerGram))
  return { dailyG: totalSteps / stepsPerGram, perFeedG }
}

/** Biomass, daily ration and the per-feed amounts for one tank or group on one day. */
export function planDailyRation(input: RationInput): RationPlan {
  const biomass = biomassKg(input.count, input.meanWeightG)
  const exactDailyG = dailyRationG(biomass, input.ratePercentPerDay)
  const { dailyG, perFeedG } = splitDailyRation(exactDailyG, input.feeds, input.scaleDecimals)
  return { biomassKg: biomass, exactDailyG, dailyG, perFeedG }
}
