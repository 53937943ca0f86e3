import { describe, expect, it } from 'vitest'
import {
  AMMONIA_SALINITY_RANGE_G_PER_KG,
  FRESHWATER_AMMONIA_TEMPERATURE_RANGE_C,
  SALINE_AMMONIA_TEMPERATURE_RANGE_C,
  ammoniaMethodFor,
  unionizedAmmoniaFraction,
  unionizedAmmoniaMgL,
} from '#shared/water/ammonia'
import reference from '../../fixtures/ammonia_nh3.json'

const rowsFrom = (sourcePrefix: string) => reference.rows.filter((row) => row.source.startsWith(sourcePrefix))

const emersonRows = rowsFrom('Emerson, K.').map((row) => ({
  source: row.source,
  tempC: row.inputs.temp_C,
  pH: row.inputs.pH,
  expected: Number(row.expected),
  toleranceRelative: Number(row.tolerance_rel),
}))

const fa16Rows = rowsFrom('UF/IFAS EDIS FA16').map((row) => ({
  source: row.source,
  kind: row.kind,
  tempC: row.inputs.temp_C,
  pH: row.inputs.pH,
  tanMgL: row.inputs.TAN_mg_per_L,
  expected: Number(row.expected),
  tolerance: Number(row.tolerance_abs),
}))
const fa16TableRows = fa16Rows.filter((row) => row.kind === 'published_table')
const fa16WorkedExample = fa16Rows.find((row) => row.kind === 'published_worked_example')

const cleggWhitfieldRows = rowsFrom('R package wq').map((row) => {
  const expected = row.expected as { total_scale: number; free_scale: number }
  return {
    source: row.source,
    tempC: row.inputs.temp_C,
    pH: row.inputs.pH,
    salinity: Number(row.inputs.salinity),
    // Only the total-scale value checks the calculator; the free-scale fit is not implemented.
    expected: expected.total_scale,
    tolerance: Number(row.tolerance_abs),
  }
})
const cleggWhitfieldSeawaterRows = cleggWhitfieldRows.filter((row) => row.salinity > 0)
const cleggWhitfieldZeroSalinityRows = cleggWhitfieldRows.filter((row) => row.salinity === 0)

// Far too little salt to matter (it shifts pKa by < 1e-5) but enough to route to the saline equation.
const TRACE_SALINITY = 1e-9

describe('fresh-water un-ionised ammonia follows Emerson et al. (1975)', () => {
  it('checks every copied row: 35 equation rows, 6 FA16 table rows, 1 worked example, 4 Clegg & Whitfield rows', () => {
    expect(emersonRows).toHaveLength(35)
    expect(fa16TableRows).toHaveLength(6)
    expect(fa16WorkedExample).toBeDefined()
    expect(cleggWhitfieldRows).toHaveLength(4)
    expect(reference.rows).toHaveLength(35 + 6 + 1 + 4)
  })

  for (const { source, tempC, pH, expected, toleranceRelative } of emersonRows) {
    it(`matches Emerson et al. (1975) at ${tempC} °C, pH ${pH}: ${expected} ± ${toleranceRelative} relative`, () => {
      const fraction = unionizedAmmoniaFraction(pH, tempC)
      expect(Math.abs(fraction - expected) / expected, source).toBeLessThanOrEqual(toleranceRelative)
    })
  }

  for (const { source, tempC, pH, expected, tolerance } of fa16TableRows) {
    it(`matches the UF/IFAS FA16 table at ${tempC} °C, pH ${pH}: ${expected} ± ${tolerance}`, () => {
      expect(Math.abs(unionizedAmmoniaFraction(pH, tempC) - expected), source).toBeLessThanOrEqual(tolerance)
    })
  }

  it('reproduces the UF/IFAS FA16 worked example: 1.0 mg/L TAN at 24 °C, pH 8.0 holds 0.0502 mg/L NH3-N', () => {
    const example = fa16WorkedExample
    if (!example) throw new Error('the FA16 worked example is missing from the fixture')
    const nh3 = unionizedAmmoniaMgL(Number(example.tanMgL), example.pH, example.tempC)
    expect(Math.abs(nh3 - example.expected), example.source).toBeLessThanOrEqual(example.tolerance)
  })

  it('follows the equation, not the FA16 table value 0.0093 at 32 °C, pH 7.0 that the reference set excludes', () => {
    const [excluded] = reference.excluded
    const fraction = unionizedAmmoniaFraction(excluded.inputs.pH, excluded.inputs.temp_C)
    expect(fraction).toBeCloseTo(excluded.emerson, 6)
    expect(Math.abs(fraction - excluded.published)).toBeGreaterThan(1e-4)
  })

  it('treats a salinity left out as fresh water', () => {
    expect(unionizedAmmoniaFraction(7.5, 15)).toBe(unionizedAmmoniaFraction(7.5, 15, 0))
    expect(ammoniaMethodFor(0)).toBe('freshwater')
  })

  it('gives more NH3 as pH or temperature rises', () => {
    expect(unionizedAmmoniaFraction(8.5, 20)).toBeGreaterThan(unionizedAmmoniaFraction(7.5, 20))
    expect(unionizedAmmoniaFraction(8, 28)).toBeGreaterThan(unionizedAmmoniaFraction(8, 12))
  })

  it('scales NH3 with TAN, and no TAN means no NH3', () => {
    const fraction = unionizedAmmoniaFraction(7.8, 16)
    expect(unionizedAmmoniaMgL(2.5, 7.8, 16)).toBeCloseTo(2.5 * fraction, 12)
    expect(unionizedAmmoniaMgL(0, 7.8, 16)).toBe(0)
  })
})

describe('saline un-ionised ammonia follows Clegg & Whitfield (1995) on the total pH scale', () => {
  const sourceName = 'Clegg & Whitfield (1995) as published in R package wq (ammFrac)'

  for (const { source, tempC, pH, salinity, expected, tolerance } of cleggWhitfieldSeawaterRows) {
    it(`matches ${sourceName} at ${tempC} °C, pH ${pH}, salinity ${salinity}: ${expected} ± ${tolerance}`, () => {
      expect(Math.abs(unionizedAmmoniaFraction(pH, tempC, salinity) - expected), source).toBeLessThanOrEqual(tolerance)
    })
  }

  for (const { source, tempC, pH, expected, tolerance } of cleggWhitfieldZeroSalinityRows) {
    it(`matches ${sourceName} at ${tempC} °C, pH ${pH} with only a trace of salt: ${expected} ± ${tolerance}`, () => {
      const fraction = unionizedAmmoniaFraction(pH, tempC, TRACE_SALINITY)
      expect(Math.abs(fraction - expected), source).toBeLessThanOrEqual(tolerance)
    })
  }

  // Cross-check, not a check value: at salinity 0 the calculator uses Emerson, and Clegg & Whitfield's own
  // salinity-0 values differ from Emerson by up to 0.45 %. A 0.5 % relative tolerance shows that moving
  // from fresh water to the first trace of salt does not make the result jump.
  for (const { source, tempC, pH, expected } of cleggWhitfieldZeroSalinityRows) {
    it(`agrees within 0.5 % with ${sourceName} in fresh water at ${tempC} °C, pH ${pH}`, () => {
      const fraction = unionizedAmmoniaFraction(pH, tempC, 0)
      expect(Math.abs(fraction - expected) / expected, source).toBeLessThanOrEqual(0.005)
    })
  }

  it('uses the saline equation for any salinity above 0, up to 40 g/kg', () => {
    expect(ammoniaMethodFor(0.01)).toBe('saline')
    expect(ammoniaMethodFor(40)).toBe('saline')
  })

  it('accepts sea water just below 0 °C, which fresh water cannot be', () => {
    expect(unionizedAmmoniaFraction(8, -1.5, 35)).toBeGreaterThan(0)
    expect(() => unionizedAmmoniaFraction(8, -1.5, 0)).toThrow(/outside 0–50 °C/)
  })
})

describe('inputs outside the range of the equations are refused with a clear message', () => {
  it('refuses a pH that cannot be a reading', () => {
    expect(() => unionizedAmmoniaFraction(15, 20)).toThrow('pH 15 is outside 0–14, the range of the pH scale')
    expect(() => unionizedAmmoniaFraction(-1, 20)).toThrow('pH -1 is outside 0–14')
  })

  it('refuses fresh water at 55 °C, naming the Emerson range', () => {
    expect(() => unionizedAmmoniaFraction(7, 55)).toThrow(
      'Temperature 55 °C is outside 0–50 °C, the range of the Emerson et al. (1975) fresh-water ammonia equation',
    )
  })

  it('refuses sea water at 45 °C, naming the Clegg & Whitfield range', () => {
    expect(() => unionizedAmmoniaFraction(8, 45, 30)).toThrow(
      'Temperature 45 °C is outside -2–40 °C, the range of the Clegg & Whitfield (1995) saline ammonia equation',
    )
  })

  it('refuses a salinity above 40 g/kg or below 0', () => {
    expect(() => unionizedAmmoniaFraction(8, 20, 45)).toThrow(
      'Salinity 45 g/kg is outside 0–40 g/kg, the range of the Clegg & Whitfield (1995) saline ammonia equation',
    )
    expect(() => unionizedAmmoniaFraction(8, 20, -0.1)).toThrow('Salinity -0.1 g/kg is outside 0–40 g/kg')
  })

  it('refuses a missing number (NaN) for pH, temperature, salinity or TAN', () => {
    expect(() => unionizedAmmoniaFraction(Number.NaN, 20)).toThrow('pH must be a number (got NaN)')
    expect(() => unionizedAmmoniaFraction(7, Number.NaN)).toThrow('Temperature must be a number (got NaN)')
    expect(() => unionizedAmmoniaFraction(7, 20, Number.NaN)).toThrow('Salinity must be a number (got NaN)')
    expect(() => unionizedAmmoniaMgL(Number.NaN, 7, 20)).toThrow('Total ammonia nitrogen must be a number (got NaN)')
  })

  it('refuses a negative TAN reading', () => {
    expect(() => unionizedAmmoniaMgL(-0.2, 7, 20)).toThrow('Total ammonia nitrogen -0.2 mg/L is negative; a concentration is 0 mg/L or more')
  })

  it('accepts the exported range limits themselves, so the UI can show them as inclusive', () => {
    for (const tempC of [FRESHWATER_AMMONIA_TEMPERATURE_RANGE_C.min, FRESHWATER_AMMONIA_TEMPERATURE_RANGE_C.max]) {
      expect(unionizedAmmoniaFraction(7, tempC, 0)).toBeGreaterThan(0)
    }
    for (const tempC of [SALINE_AMMONIA_TEMPERATURE_RANGE_C.min, SALINE_AMMONIA_TEMPERATURE_RANGE_C.max]) {
      expect(unionizedAmmoniaFraction(8, tempC, AMMONIA_SALINITY_RANGE_G_PER_KG.max)).toBeGreaterThan(0)
    }
  })
})
