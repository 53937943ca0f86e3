import { describe, expect, it } from 'vitest'
import {
  BAROMETRIC_PRESSURE_RANGE_KPA,
  OXYGEN_SALINITY_RANGE_G_PER_KG,
  OXYGEN_TEMPERATURE_RANGE_C,
  STANDARD_PRESSURE_KPA,
  oxygenPercentSaturation,
  oxygenSolubilityMgL,
} from '#shared/water/oxygen'
import reference from '../../fixtures/do_saturation.json'

/** One expected solubility with the conditions it was given for; `source` is the row's full citation. */
type SolubilityCheck = {
  sourceName: string
  source: string
  tempC: number
  salinity: number
  pressureKpa: number
  expected: number
  tolerance: number
  label: string
}

// Salinity from chlorinity, S = 1.80655 Cl: the sea-water relation behind the table's approximate-salinity column.
const SALINITY_PER_CHLORINITY = 1.80655

const rowsFrom = (sourcePrefix: string) => reference.rows.filter((row) => row.source.startsWith(sourcePrefix))

const standardMethodsChecks: SolubilityCheck[] = rowsFrom('Standard Methods').map((row) => {
  const chlorinity = Number(row.inputs.chlorinity_g_per_kg)
  return {
    sourceName: 'the Standard Methods (APHA) chlorinity table',
    source: row.source,
    tempC: row.inputs.temp_C,
    salinity: chlorinity * SALINITY_PER_CHLORINITY,
    pressureKpa: STANDARD_PRESSURE_KPA,
    expected: Number(row.expected),
    tolerance: row.tolerance_abs,
    label: `chlorinity ${chlorinity} g/kg (salinity ${(chlorinity * SALINITY_PER_CHLORINITY).toFixed(2)} g/kg)`,
  }
})

const bensonKrauseChecks: SolubilityCheck[] = rowsFrom('Benson, B.B. & Krause').map((row) => ({
  sourceName: 'Benson & Krause (1984) as adopted by USGS and APHA',
  source: row.source,
  tempC: row.inputs.temp_C,
  salinity: Number(row.inputs.salinity_g_per_kg),
  pressureKpa: STANDARD_PRESSURE_KPA,
  expected: Number(row.expected),
  tolerance: row.tolerance_abs,
  label: `salinity ${row.inputs.salinity_g_per_kg} g/kg`,
}))

const pressureChecks: SolubilityCheck[] = rowsFrom('USGS OWQ Technical Memorandum 2011.03').map((row) => ({
  sourceName: 'the USGS TM 2011.03 pressure correction',
  source: row.source,
  tempC: row.inputs.temp_C,
  salinity: Number(row.inputs.salinity),
  pressureKpa: Number(row.inputs.pressure_atm) * STANDARD_PRESSURE_KPA,
  expected: Number(row.expected),
  tolerance: row.tolerance_abs,
  label: `${row.inputs.pressure_atm} atm, salinity ${row.inputs.salinity} g/kg`,
}))

describe('oxygen solubility follows the Benson & Krause (1984) equations', () => {
  // The Standard Methods table's identity as the 4500-O table is recalled, not read, but every printed value
  // was checked against the Benson & Krause equation, so its rows hold as check values at their own tolerance.
  for (const check of [...standardMethodsChecks, ...bensonKrauseChecks, ...pressureChecks]) {
    const expectation = `${check.expected} mg/L ± ${check.tolerance}`
    it(`matches ${check.sourceName} at ${check.tempC} °C, ${check.label}: ${expectation}`, () => {
      const solubility = oxygenSolubilityMgL(check.tempC, check.salinity, check.pressureKpa)
      expect(Math.abs(solubility - check.expected), check.source).toBeLessThanOrEqual(check.tolerance)
    })
  }

  it('checks every copied row: 22 table rows, 37 equation rows and 2 pressure rows', () => {
    expect([standardMethodsChecks.length, bensonKrauseChecks.length, pressureChecks.length]).toEqual([22, 37, 2])
    expect(reference.rows).toHaveLength(22 + 37 + 2)
  })

  it('leaves out the chlorinity-25 table rows, whose salinity (~45 g/kg) is beyond the equation', () => {
    for (const row of reference.excluded_rows) {
      const salinity = row.inputs.chlorinity_g_per_kg * SALINITY_PER_CHLORINITY
      expect(() => oxygenSolubilityMgL(row.inputs.temp_C, salinity)).toThrow(/outside 0–40 g\/kg/)
    }
  })

  it('uses sea-level pressure when no pressure is given', () => {
    expect(oxygenSolubilityMgL(15, 0)).toBe(oxygenSolubilityMgL(15, 0, STANDARD_PRESSURE_KPA))
  })

  it('holds less oxygen in warmer and in saltier water', () => {
    expect(oxygenSolubilityMgL(25, 0)).toBeLessThan(oxygenSolubilityMgL(10, 0))
    expect(oxygenSolubilityMgL(15, 35)).toBeLessThan(oxygenSolubilityMgL(15, 0))
  })
})

describe('the barometric-pressure correction', () => {
  it('lowers solubility at a mountain hatchery (80 kPa) and raises it under a high (105 kPa)', () => {
    const atSeaLevel = oxygenSolubilityMgL(12, 0)
    expect(oxygenSolubilityMgL(12, 0, 80)).toBeLessThan(atSeaLevel)
    expect(oxygenSolubilityMgL(12, 0, 105)).toBeGreaterThan(atSeaLevel)
  })

  it('scales close to in proportion to pressure, a little less because water vapour takes a fixed share', () => {
    const ratio = oxygenSolubilityMgL(20, 0, 0.8 * STANDARD_PRESSURE_KPA) / oxygenSolubilityMgL(20, 0)
    expect(ratio).toBeLessThan(0.8)
    expect(ratio).toBeGreaterThan(0.79)
  })
})

describe('percent saturation', () => {
  it('is 100 % when the measured oxygen equals the solubility', () => {
    const solubility = oxygenSolubilityMgL(18, 5, 95)
    expect(oxygenPercentSaturation(solubility, 18, 5, 95)).toBeCloseTo(100, 10)
  })

  it('reads 9.092 mg/L in fresh water at 20 °C and sea level (Standard Methods table) as about 100 %', () => {
    expect(oxygenPercentSaturation(9.092, 20, 0)).toBeCloseTo(100, 1)
  })

  it('is 50 % at half the solubility and above 100 % when supersaturated', () => {
    const solubility = oxygenSolubilityMgL(8, 0)
    expect(oxygenPercentSaturation(solubility / 2, 8, 0)).toBeCloseTo(50, 10)
    expect(oxygenPercentSaturation(solubility * 1.4, 8, 0)).toBeCloseTo(140, 10)
  })

  it('is higher for the same reading at altitude, because less oxygen can dissolve there', () => {
    expect(oxygenPercentSaturation(8, 15, 0, 80)).toBeGreaterThan(oxygenPercentSaturation(8, 15, 0))
  })

  it('is 0 % for water with no oxygen', () => {
    expect(oxygenPercentSaturation(0, 15, 0)).toBe(0)
  })
})

describe('inputs outside the range of the equations are refused with a clear message', () => {
  it('refuses a temperature of 60 °C, naming the input and the range', () => {
    expect(() => oxygenSolubilityMgL(60, 0)).toThrow('Temperature 60 °C is outside 0–40 °C, the range of the Benson & Krause equation')
  })

  it('refuses water below 0 °C', () => {
    expect(() => oxygenSolubilityMgL(-1, 35)).toThrow('Temperature -1 °C is outside 0–40 °C')
  })

  it('refuses a salinity of 45 g/kg and a negative salinity', () => {
    expect(() => oxygenSolubilityMgL(10, 45)).toThrow('Salinity 45 g/kg is outside 0–40 g/kg, the range of the Benson & Krause equation')
    expect(() => oxygenSolubilityMgL(10, -2)).toThrow('Salinity -2 g/kg is outside 0–40 g/kg')
  })

  it('refuses a pressure of 760 typed in mm Hg where kPa is expected', () => {
    expect(() => oxygenSolubilityMgL(10, 0, 760)).toThrow(
      'Barometric pressure 760 kPa is outside 51–111 kPa, ' + 'the range of the Benson & Krause pressure correction (0.5–1.1 atm)',
    )
  })

  it('refuses a pressure too low for the correction (30 kPa)', () => {
    expect(() => oxygenSolubilityMgL(10, 0, 30)).toThrow('Barometric pressure 30 kPa is outside 51–111 kPa')
  })

  it('refuses a missing number (NaN) or infinity for any input', () => {
    expect(() => oxygenSolubilityMgL(Number.NaN, 0)).toThrow('Temperature must be a number (got NaN)')
    expect(() => oxygenSolubilityMgL(10, Number.NaN)).toThrow('Salinity must be a number (got NaN)')
    expect(() => oxygenSolubilityMgL(10, 0, Number.POSITIVE_INFINITY)).toThrow('Barometric pressure must be a number (got Infinity)')
    expect(() => oxygenPercentSaturation(Number.NaN, 10, 0)).toThrow('Dissolved oxygen must be a number (got NaN)')
  })

  it('refuses a negative oxygen reading', () => {
    expect(() => oxygenPercentSaturation(-0.5, 10, 0)).toThrow('Dissolved oxygen -0.5 mg/L is negative; a concentration is 0 mg/L or more')
  })

  it('accepts the exported range limits themselves, so the UI can show them as inclusive', () => {
    for (const tempC of [OXYGEN_TEMPERATURE_RANGE_C.min, OXYGEN_TEMPERATURE_RANGE_C.max]) {
      for (const salinity of [OXYGEN_SALINITY_RANGE_G_PER_KG.min, OXYGEN_SALINITY_RANGE_G_PER_KG.max]) {
        for (const pressureKpa of [BAROMETRIC_PRESSURE_RANGE_KPA.min, BAROMETRIC_PRESSURE_RANGE_KPA.max]) {
          expect(oxygenSolubilityMgL(tempC, salinity, pressureKpa)).toBeGreaterThan(0)
        }
      }
    }
  })
})
