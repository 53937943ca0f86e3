/** Biomass in kilograms: fish × mean weight in grams. */
export function biomassKg(count: number, meanWeightG: number): number {
  return (count * meanWeightG) / 1000
}

/**
 * Stocking density in kg/m³: biomass over the tank's water volume. A litre is 1/1000 m³, so
 * kg/m³ is numerically grams per litre.
 */
export function stockingDensityKgM3(biomass: number, volumeL: number): number | null {
  if (!(volumeL > 0)) return null
  return biomass / (volumeL / 1000)
}

export const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places
