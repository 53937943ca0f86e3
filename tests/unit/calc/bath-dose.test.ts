import { describe, expect, it } from 'vitest'
import {
  BATH_CAUTIONS,
  LITRES_PER_US_GALLON,
  PERMANGANATE_CAUTIONS,
  PUBLISHED_PERMANGANATE_BATHS,
  bathDose,
  concentrationFromStock,
  demandBasedPermanganateMgPerL,
  stockStrengthFromRecipe,
  stockStrengthGPerL,
  stockVolumeForBath,
} from '#shared/dosing/bath-dose'
import reference from '../../fixtures/kmno4.json'

const relativeError = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected)
const GRAMS_PER_POUND = 453.59237 // exact, international avoirdupois pound

describe('grams of product for a static bath (unit definition 1 mg/L = 1 g/m³)', () => {
  it.each(reference.mass_checks.map((row) => [row.inputs.target_mg_per_L, row.inputs.volume_L, row] as const))(
    '%f mg/L in %f L needs the tabulated grams of pure product',
    (_target, _volume, row) => {
      const dose = bathDose({ targetMgPerL: row.inputs.target_mg_per_L, bathVolumeL: row.inputs.volume_L })
      expect(relativeError(dose.productG, row.expected_g)).toBeLessThan(1e-12)
      expect(dose.activeIngredientG).toBe(dose.productG)
    },
  )

  it('a product that is not pure needs more weighed out: divide by the purity fraction (row formula)', () => {
    const row = reference.mass_checks[0]
    const dose = bathDose({
      targetMgPerL: row.inputs.target_mg_per_L,
      bathVolumeL: row.inputs.volume_L,
      purityPercent: 97,
    })
    expect(dose.activeIngredientG).toBeCloseTo(row.expected_g, 12)
    expect(dose.productG).toBeCloseTo(row.expected_g / 0.97, 12)
  })

  it('one acre-foot at 1 mg/L takes 1233.48 g, about 2.719 lb', () => {
    const acreFootL = 1233481.8 // 1 acre-ft = 1233.48 m³, the conversion the row cites
    const grams = bathDose({ targetMgPerL: 1, bathVolumeL: acreFootL }).productG
    expect(grams).toBeCloseTo(reference.acre_foot.expected.g, 2)
    expect(grams / GRAMS_PER_POUND).toBeCloseTo(reference.acre_foot.expected.lb, 3)
  })

  it('the planned duration is kept with the result and does not change a static-bath amount', () => {
    const short = bathDose({ targetMgPerL: 10, bathVolumeL: 500, durationMinutes: 30 })
    const long = bathDose({ targetMgPerL: 10, bathVolumeL: 500, durationMinutes: 240 })
    expect(short.productG).toBe(long.productG)
    expect(short.durationMinutes).toBe(30)
    expect(bathDose({ targetMgPerL: 10, bathVolumeL: 500 }).durationMinutes).toBeNull()
  })

  it.each([
    ['a bath volume of 0', { targetMgPerL: 2, bathVolumeL: 0 }],
    ['a negative target', { targetMgPerL: -2, bathVolumeL: 100 }],
    ['a purity of 0 %', { targetMgPerL: 2, bathVolumeL: 100, purityPercent: 0 }],
    ['a purity over 100 %', { targetMgPerL: 2, bathVolumeL: 100, purityPercent: 120 }],
    ['a duration of 0', { targetMgPerL: 2, bathVolumeL: 100, durationMinutes: 0 }],
  ])('%s is refused', (_label, input) => {
    expect(() => bathDose(input)).toThrow(RangeError)
  })
})

describe('stock solution, UF/IFAS FA37 worked example (285 g in one US gallon)', () => {
  const example = reference.stock_solution_example
  const tolerance = example.tolerance_rel
  const stock = stockStrengthFromRecipe({ productG: 285, solutionVolumeL: LITRES_PER_US_GALLON })
  // "20 drops = 1 mL" is one of the published claims of the example.
  const dropMl = 1 / 20

  it('makes a stock of 75.29 g/L', () => {
    expect(relativeError(stockStrengthGPerL(stock), example.expected.stock_g_per_L)).toBeLessThan(tolerance)
  })

  it('one drop per gallon gives 0.994 mg/L, the published "about 1 mg/L"', () => {
    const mgPerL = concentrationFromStock(dropMl, LITRES_PER_US_GALLON, stock)
    expect(relativeError(mgPerL, example.expected.dose_1_drop_per_gal_mg_per_L)).toBeLessThan(tolerance)
    expect(relativeError(mgPerL, 1)).toBeLessThan(tolerance)
  })

  it('two drops per gallon give the published 2 mg/L', () => {
    expect(relativeError(concentrationFromStock(2 * dropMl, LITRES_PER_US_GALLON, stock), 2)).toBeLessThan(tolerance)
  })

  it('1 mL per 10 gallons gives 1.989 mg/L, the published "2 mg/L"', () => {
    const mgPerL = concentrationFromStock(1, 10 * LITRES_PER_US_GALLON, stock)
    expect(relativeError(mgPerL, example.expected.dose_1_mL_per_10_gal_mg_per_L)).toBeLessThan(tolerance)
    expect(relativeError(mgPerL, 2)).toBeLessThan(tolerance)
  })

  it('asking for 2 mg/L in 10 gallons returns about 1 mL of stock, the reverse of the claim', () => {
    const addition = stockVolumeForBath(2, 10 * LITRES_PER_US_GALLON, stock)
    expect(relativeError(addition.stockMl, 1)).toBeLessThan(tolerance)
    expect(addition.activeIngredientG).toBeCloseTo((2 * 10 * LITRES_PER_US_GALLON) / 1000, 12)
  })

  it('a strength written as mg/mL gives the same volume as the same number in g/L', () => {
    const inGramsPerLitre = stockVolumeForBath(4, 250, { gPerL: 20 })
    const inMilligramsPerMl = stockVolumeForBath(4, 250, { mgPerMl: 20 })
    expect(inMilligramsPerMl).toEqual(inGramsPerLitre)
    expect(inGramsPerLitre.stockMl).toBeCloseTo(50, 12)
  })

  it('a stock of zero strength is refused instead of asking for infinite millilitres', () => {
    expect(() => stockVolumeForBath(2, 100, { gPerL: 0 })).toThrow(RangeError)
  })
})

describe('published permanganate baths shown beside the calculator', () => {
  const byQuantity = (quantity: string) => {
    const row = reference.published_doses.find((candidate) => candidate.quantity === quantity)
    if (!row) throw new Error(`${quantity} missing from the fixture`)
    return row.expected
  }
  const entry = (id: string) => {
    const found = PUBLISHED_PERMANGANATE_BATHS.find((candidate) => candidate.id === id)
    if (!found) throw new Error(`${id} missing from the published list`)
    return found
  }

  it('carry the concentrations FA37 prints: 2 mg/L prolonged, 10 mg/L for 30 min, 1 mg/L sensitive', () => {
    expect(entry('fa37-prolonged').mgPerL).toBe(byQuantity('prolonged bath').mg_per_L)
    expect(entry('fa37-short').mgPerL).toBe(byQuantity('short-term bath').mg_per_L)
    expect(entry('fa37-short').duration).toContain(`${byQuantity('short-term bath').duration_min} min`)
    expect(entry('fa37-sensitive').mgPerL).toBe(byQuantity('sensitive species / first treatment').mg_per_L)
  })

  it('carry the organic-demand top-up (2 mg/L steps up to 6 mg/L) and the INAD 9246 ceiling of 10 mg/L', () => {
    const topUp = byQuantity('organic-demand top-up')
    expect(entry('fa37-organic-demand')).toMatchObject({
      mgPerL: topUp.increment_mg_per_L,
      upToMgPerL: topUp.max_total_mg_per_L,
    })
    expect(entry('inad-9246').upToMgPerL).toBe(byQuantity('INAD 9246 regime').max_ppm)
  })

  it('every entry names its source', () => {
    for (const bath of PUBLISHED_PERMANGANATE_BATHS) expect(bath.source.length).toBeGreaterThan(40)
  })

  it.each(reference.demand_rule_checks.map((row) => [row.inputs.PPD_15min_mg_per_L, row.expected_ppm, row] as const))(
    'INAD 9246 rule: a 15-minute demand of %f mg/L gives %f mg/L',
    (demand, expected) => {
      const result = demandBasedPermanganateMgPerL(demand)
      expect(result.mgPerL).toBeCloseTo(expected, 12)
      expect(result.capped).toBe(2.5 * demand > expected)
    },
  )
})

// The caution topics are common practice for any bath treatment; the formalin warning is from the FA37 copy.
describe('bath cautions (common practice)', () => {
  const all = BATH_CAUTIONS.join(' ')

  it.each([
    ['organic load', /organic load/],
    ['water chemistry', /water chemistry/],
    ['temperature', /temperature/],
    ['a few fish first', /few fish first/],
    ['watching throughout', /throughout/],
    ['the veterinarian', /veterinarian/],
    ['the label or permit', /label or permit/],
    ['local regulations', /local regulations/],
    ['gloves and eye protection', /gloves and eye protection/],
  ])('mention %s', (_topic, pattern) => {
    expect(all).toMatch(pattern)
  })

  it('say outright that the figures are not a prescription', () => {
    expect(all).toMatch(/not a prescription/)
  })

  it('warn against mixing permanganate with formalin, as the source does', () => {
    expect(reference.safety_note).toMatch(/formalin/)
    expect(PERMANGANATE_CAUTIONS.join(' ')).toMatch(/formalin/)
  })
})
