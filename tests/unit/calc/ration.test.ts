import { describe, expect, it } from 'vitest'
import { biomassKg, dailyRationG, planDailyRation, splitDailyRation } from '#shared/feeding/ration'
import reference from '../../fixtures/feeding.json'

/** Sum of portions counted in whole scale steps, so the comparison itself adds no rounding. */
const stepsIn = (grams: number[], scaleDecimals: number) => grams.reduce((total, portion) => total + Math.round(portion * 10 ** scaleDecimals), 0)

describe('ration = biomass × % body weight per day (definitions in the feeding reference)', () => {
  it('2000 fish of 50 g at 3 %/day are 100 kg of fish eating 3 kg a day', () => {
    const { inputs, expected } = reference.ration_from_count
    const biomass = biomassKg(inputs.count, inputs.mean_weight_g)
    expect(biomass).toBeCloseTo(expected.biomass_kg, 12)
    expect(dailyRationG(biomass, inputs.rate_pct_bw_day) / 1000).toBeCloseTo(expected.ration_kg_per_day, 12)
  })

  it('11.4 kg at 4 %/day is 456 g a day, 114 g at each of 4 feeds', () => {
    const { inputs, expected } = reference.ration_split
    const daily = dailyRationG(inputs.biomass_kg, inputs.rate_pct_bw_day)
    expect(daily).toBeCloseTo(expected.ration_g_per_day, 12)
    const split = splitDailyRation(daily, inputs.meals)
    expect(split.perFeedG).toEqual(Array.from({ length: inputs.meals }, () => expected.per_meal_g))
    expect(split.dailyG).toBe(expected.ration_g_per_day)
  })

  it('planDailyRation chains the same steps from count and mean weight', () => {
    const { inputs, expected } = reference.ration_from_count
    const plan = planDailyRation({
      count: inputs.count,
      meanWeightG: inputs.mean_weight_g,
      ratePercentPerDay: inputs.rate_pct_bw_day,
      feeds: 3,
    })
    expect(plan.biomassKg).toBeCloseTo(expected.biomass_kg, 12)
    expect(plan.dailyG).toBeCloseTo(expected.ration_kg_per_day * 1000, 9)
    expect(plan.perFeedG).toEqual([1000, 1000, 1000])
  })
})

describe('splitting the day’s ration across feeds', () => {
  it('100 g in 3 feeds on a 0.1 g scale is 33.4 + 33.3 + 33.3: the first feed takes the spare step', () => {
    const split = splitDailyRation(100, 3, 1)
    expect(split.perFeedG).toEqual([33.4, 33.3, 33.3])
    expect(stepsIn(split.perFeedG, 1)).toBe(1000)
  })

  it('the daily total is rounded once to the scale, and the feeds add back to that rounded total', () => {
    const plan = planDailyRation({ count: 1234, meanWeightG: 3.21, ratePercentPerDay: 2.5, feeds: 4, scaleDecimals: 1 })
    expect(plan.exactDailyG).toBeCloseTo(99.0285, 9)
    expect(plan.dailyG).toBe(99)
    expect(stepsIn(plan.perFeedG, 1)).toBe(990)
  })

  it('on a whole-gram scale the portions are whole grams', () => {
    const split = splitDailyRation(17.6, 5, 0)
    expect(split.dailyG).toBe(18)
    expect(split.perFeedG).toEqual([4, 4, 4, 3, 3])
  })

  it('for many rations and feed counts, portions add back exactly and differ by at most one step', () => {
    let seed = 20240611
    const nextRandom = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648
    for (let trial = 0; trial < 500; trial++) {
      const daily = nextRandom() * 5000
      const feeds = 1 + Math.floor(nextRandom() * 8)
      const decimals = Math.floor(nextRandom() * 3)
      const split = splitDailyRation(daily, feeds, decimals)
      const steps = split.perFeedG.map((portion) => Math.round(portion * 10 ** decimals))
      expect(split.perFeedG).toHaveLength(feeds)
      expect(stepsIn(split.perFeedG, decimals)).toBe(Math.round(daily * 10 ** decimals))
      expect(Math.max(...steps) - Math.min(...steps)).toBeLessThanOrEqual(1)
      expect(Math.abs(split.dailyG - daily)).toBeLessThanOrEqual(0.5 / 10 ** decimals + 1e-9)
    }
  })
})

describe('ration inputs that make no sense are refused', () => {
  it.each([
    ['0 fish', () => biomassKg(0, 50)],
    ['a fractional fish count', () => biomassKg(10.5, 50)],
    ['a mean weight of 0 g', () => biomassKg(100, 0)],
    ['a feeding rate of 0 %', () => dailyRationG(10, 0)],
    ['a negative feeding rate', () => dailyRationG(10, -1)],
    ['no feeds in the day', () => splitDailyRation(100, 0)],
    ['a fractional number of feeds', () => splitDailyRation(100, 2.5)],
    ['a negative daily ration', () => splitDailyRation(-1, 2)],
    ['negative scale decimals', () => splitDailyRation(100, 2, -1)],
  ])('%s', (_label, attempt) => {
    expect(attempt).toThrow(RangeError)
  })
})
