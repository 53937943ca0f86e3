/** Common practice: match transport and receiving water before fish go in (pH within 0.5). */
export const PH_DIFFERENCE_LIMIT = 0.5

export interface WaterSample {
  tempC: number
  pH: number
  doMgL?: number
}

export interface WaterComparison {
  tempDifferenceC: number
  pHDifference: number
  warnings: string[]
}

/**
 * Compares a transport box with the receiving water. Warnings carry the usual guidance:
 * temper gradually and follow the veterinarian's and the supplier's advice; the numbers are
 * a prompt, not a rule for any particular species.
 */
export function compareWater(box: WaterSample, receiving: WaterSample, tempLimitC: number): WaterComparison {
  const tempDifferenceC = Math.round((box.tempC - receiving.tempC) * 10) / 10
  const pHDifference = Math.round((box.pH - receiving.pH) * 100) / 100
  const warnings: string[] = []
  if (Math.abs(tempDifferenceC) > tempLimitC) {
    warnings.push(
      `Temperature differs by ${Math.abs(tempDifferenceC)} °C (limit ${tempLimitC} °C): temper gradually, mixing receiving water into the box in steps, before releasing the fish.`,
    )
  }
  if (Math.abs(pHDifference) > PH_DIFFERENCE_LIMIT) {
    warnings.push(
      `pH differs by ${Math.abs(pHDifference)} (limit ${PH_DIFFERENCE_LIMIT}): adjust slowly; a rise in pH turns more of the transport water's ammonia toxic, so exchange water promptly.`,
    )
  }
  if (box.doMgL !== undefined && box.doMgL < 5) warnings.push(`Transport water DO is low (${box.doMgL} mg/L): aerate or oxygenate the box now.`)
  return { tempDifferenceC, pHDifference, warnings }
}
