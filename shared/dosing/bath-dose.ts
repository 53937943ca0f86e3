/**
 * Bath-treatment arithmetic: how much product to weigh for a static bath at a target concentration,
 * or how much of a stock solution to add instead. Pure unit arithmetic — which concentration and
 * exposure to use is a decision for the veterinarian, the product label or permit (see BATH_CAUTIONS).
 *
 * 1 mg/L = 1 g/m³, so active ingredient (g) = concentration (mg/L) × volume (L) / 1000.
 * g/L and mg/mL are the same strength (1 g/L = 1000 mg / 1000 mL).
 */
export { BATH_CAUTIONS, PERMANGANATE_CAUTIONS, PUBLISHED_PERMANGANATE_BATHS, demandBasedPermanganateMgPerL } from './published-baths'
export type { DemandBasedConcentration, PublishedBath } from './published-baths'

/** Exact by definition: 1 US gallon = 231 cubic inches = 3.785411784 L. */
export const LITRES_PER_US_GALLON = 3.785411784

const MG_PER_G = 1000

function requirePositive(value: number, name: string, unit: string): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be above 0 ${unit}, got ${value}`)
}

function requirePurity(purityPercent: number): void {
  if (!Number.isFinite(purityPercent) || purityPercent <= 0 || purityPercent > 100) {
    throw new RangeError(`Product purity must be above 0 and at most 100 %, got ${purityPercent}`)
  }
}

export type BathDoseInput = {
  targetMgPerL: number
  /** Final volume of water being treated. */
  bathVolumeL: number
  /** Active ingredient in the product as weighed; 100 for a pure product. */
  purityPercent?: number
  /** Planned exposure. A static bath needs the same amount whatever its length; carried for the record. */
  durationMinutes?: number
}

export type BathDose = {
  /** Grams of the product to weigh out. */
  productG: number
  /** Grams of active ingredient that amount contains. */
  activeIngredientG: number
  targetMgPerL: number
  bathVolumeL: number
  purityPercent: number
  durationMinutes: number | null
}

/** Product to weigh for a static bath: g = mg/L × L / 1000 / (purity / 100). */
export function bathDose(input: BathDoseInput): BathDose {
  const { targetMgPerL, bathVolumeL, purityPercent = 100, durationMinutes } = input
  requirePositive(targetMgPerL, 'Target concentration', 'mg/L')
  requirePositive(bathVolumeL, 'Bath volume', 'L')
  requirePurity(purityPercent)
  if (durationMinutes !== undefined) requirePositive(durationMinutes, 'Duration', 'minutes')
  const activeIngredientG = (targetMgPerL * bathVolumeL) / MG_PER_G
  return {
    productG: activeIngredientG / (purityPercent / 100),
    activeIngredientG,
    targetMgPerL,
    bathVolumeL,
    purityPercent,
    durationMinutes: durationMinutes ?? null,
  }
}

/** Strength of a stock solution in active ingredient, given either way it is usually written. */
export type StockStrength = { gPerL: number } | { mgPerMl: number }

/** Active ingredient per litre of stock; g/L and mg/mL are numerically equal. */
export function stockStrengthGPerL(strength: StockStrength): number {
  const gPerL = 'gPerL' in strength ? strength.gPerL : strength.mgPerMl
  requirePositive(gPerL, 'Stock strength', 'g/L')
  return gPerL
}

export type StockRecipe = {
  /** Product dissolved, as weighed. */
  productG: number
  /** Volume of finished stock solution. */
  solutionVolumeL: number
  purityPercent?: number
}

/** Strength of a stock made by dissolving `productG` of product to `solutionVolumeL`. */
export function stockStrengthFromRecipe(recipe: StockRecipe): StockStrength {
  const { productG, solutionVolumeL, purityPercent = 100 } = recipe
  requirePositive(productG, 'Product weighed', 'g')
  requirePositive(solutionVolumeL, 'Stock volume', 'L')
  requirePurity(purityPercent)
  return { gPerL: (productG * (purityPercent / 100)) / solutionVolumeL }
}

export type StockAddition = {
  /** Millilitres of stock to add to the bath. */
  stockMl: number
  /** Grams of active ingredient in that volume. */
  activeIngredientG: number
}

/**
 * Stock volume to bring a bath to the target: mL = (mg/L × L) / (mg/mL).
 * The stock added is taken to be small beside the bath, as in the published worked example
 * (a drop per gallon); for large additions, enter the final volume as the bath volume.
 */
export function stockVolumeForBath(targetMgPerL: number, bathVolumeL: number, stock: StockStrength): StockAddition {
  requirePositive(targetMgPerL, 'Target concentration', 'mg/L')
  requirePositive(bathVolumeL, 'Bath volume', 'L')
  const mgPerMl = stockStrengthGPerL(stock)
  const activeMg = targetMgPerL * bathVolumeL
  return { stockMl: activeMg / mgPerMl, activeIngredientG: activeMg / MG_PER_G }
}

/** Concentration reached by adding `stockMl` of stock to `bathVolumeL` of water (the reverse check). */
export function concentrationFromStock(stockMl: number, bathVolumeL: number, stock: StockStrength): number {
  requirePositive(stockMl, 'Stock volume added', 'mL')
  requirePositive(bathVolumeL, 'Bath volume', 'L')
  return (stockMl * stockStrengthGPerL(stock)) / bathVolumeL
}
