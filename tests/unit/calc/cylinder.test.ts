import { describe, expect, it } from 'vitest'
import {
  PUBLISHED_PSI_FACTORS,
  PUBLISHED_SAFE_RESIDUAL_PSI,
  estimateSupply,
  metricFreeGasL,
  pressureUnitFor,
  psiFactorFromRatedContents,
  type MetricCylinder,
  type PsiFactorCylinder,
} from '#shared/oxygen-supply/cylinder'
import reference from '../../fixtures/cylinder.json'

const relativeError = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected)

const psiCylinder = (factorLPerPsi: number, reservePsi = PUBLISHED_SAFE_RESIDUAL_PSI): PsiFactorCylinder => ({
  method: 'psi-factor',
  factorLPerPsi,
  reservePsi,
})

describe('psi-factor method, Virginia Office of EMS oxygen cylinder guidance', () => {
  it('worked example: a D cylinder at 2000 psi, 0.5 L/min, 200 psi residual → 288 L, 576 min', () => {
    const example = reference.psi_factor_worked_example
    const estimate = estimateSupply(psiCylinder(example.inputs.factor_L_per_psi, example.inputs.safe_residual_psi), {
      gaugePressure: example.inputs.gauge_psi,
      flowLPerMin: example.inputs.flow_L_per_min,
    })
    expect(Math.abs(estimate.usableL - example.expected.available_L)).toBeLessThanOrEqual(example.tolerance_abs)
    expect(Math.abs(estimate.minutesToReserve - example.expected.minutes)).toBeLessThanOrEqual(example.tolerance_abs)
    expect(estimate.hoursToReserve).toBeCloseTo(example.expected.minutes / 60, 12)
    expect(estimate.atOrBelowReserve).toBe(false)
  })

  it.each(reference.psi_factor_minimums.map((row) => [row.inputs.cylinder, row.inputs.gauge_psi, row] as const))(
    'published minimum pressure for a %s cylinder (%i psi at 10 L/min) lasts the tabulated minutes',
    (_size, _psi, row) => {
      const estimate = estimateSupply(psiCylinder(row.inputs.factor_L_per_psi), {
        gaugePressure: row.inputs.gauge_psi,
        flowLPerMin: row.inputs.flow_L_per_min,
      })
      expect(Math.abs(estimate.minutesToReserve - row.expected_minutes)).toBeLessThanOrEqual(row.tolerance_abs)
    },
  )

  it('the published factors, times 2200 psi, give the full contents the guidance lists', () => {
    const check = reference.full_contents_check
    const expectedBySize: Record<string, number> = {
      D: check.expected.D_L,
      E: check.expected.E_L,
      M: check.expected.M_L,
      'H/K': check.expected.H_L,
    }
    for (const { size, factorLPerPsi } of PUBLISHED_PSI_FACTORS.factors) {
      const reading = { gaugePressure: check.inputs.full_psi, flowLPerMin: 1 }
      const full = estimateSupply(psiCylinder(factorLPerPsi, 0), reading)
      expect(full.gasLeftL, size).toBeCloseTo(expectedBySize[size], 9)
    }
  })
})

describe('factor from rated contents (published worked example: E cylinder 660 L at 1900 psi)', () => {
  const example = reference.rated_contents_example

  it('500 psi at 6 L/min with no residual lasts 28.947 min, printed rounded down as 28', () => {
    const factor = psiFactorFromRatedContents(example.inputs.capacity_L, example.inputs.service_psi)
    const estimate = estimateSupply(psiCylinder(factor, 0), {
      gaugePressure: example.inputs.gauge_psi,
      flowLPerMin: example.inputs.flow_L_per_min,
    })
    expect(estimate.minutesToReserve).toBeCloseTo(example.expected.minutes_exact, 3)
    expect(Math.floor(estimate.minutesToReserve)).toBe(example.expected.minutes_published_rounded_down)
  })

  it('that factor (0.347 L/psi) differs from the 0.28 table factor for the same size: a per-cylinder setting', () => {
    const factor = psiFactorFromRatedContents(example.inputs.capacity_L, example.inputs.service_psi)
    const tableFactor = PUBLISHED_PSI_FACTORS.factors.find((entry) => entry.size === 'E')?.factorLPerPsi
    expect(factor).toBeCloseTo(0.347, 3)
    expect(relativeError(factor, tableFactor ?? 0)).toBeGreaterThan(0.2)
  })
})

describe('metric method: water capacity × pressure (rows computed with a reference O₂ equation of state)', () => {
  const zAt15C = reference.compressibility.filter((row) => row.inputs.temp_C === 15)
  /** Z from the 15 °C table row nearest the absolute pressure (the rows are ~1 bar apart from gauge + 1 atm). */
  const nearestZ = (absoluteBar: number) =>
    zAt15C.reduce((best, row) => (Math.abs(row.inputs.pressure_bar_abs - absoluteBar) < Math.abs(best.inputs.pressure_bar_abs - absoluteBar) ? row : best))
      .expected
  const zReference = 0.9992 // Z of O₂ at 1 atm and 15 °C, from the reference formulas

  const freeGasCases = reference.free_gas.map((row) => [row.inputs.water_capacity_L, row.inputs.fill_pressure_bar_gauge, row] as const)
  it.each(freeGasCases)('a %f L cylinder at %f bar holds the ideal-gas and real-gas volumes of the table', (_capacity, _bar, row) => {
    const { water_capacity_L: capacity, fill_pressure_bar_gauge: gauge } = row.inputs
    const ideal = metricFreeGasL(capacity, gauge)
    const real = metricFreeGasL(capacity, gauge, nearestZ(gauge + 1.01325), zReference)
    expect(relativeError(ideal, row.expected.ideal_gas_L)).toBeLessThan(row.tolerance_rel)
    expect(relativeError(real, row.expected.real_gas_L)).toBeLessThan(row.tolerance_rel)
  })

  it('a 10 L cylinder read at 200 bar with a 137 bar reserve lasts (1984 − 1362) L / 10 L/min', () => {
    const at = (bar: number) => reference.free_gas.find((row) => row.inputs.water_capacity_L === 10 && row.inputs.fill_pressure_bar_gauge === bar)
    const reading = at(200)
    const reserve = at(137)
    if (!reading || !reserve) throw new Error('10 L rows missing from the fixture')
    const cylinder: MetricCylinder = { method: 'metric', waterCapacityL: 10, reserveBar: 137 }
    const ideal = estimateSupply(cylinder, { gaugePressure: 200, flowLPerMin: 10 })
    expect(ideal.minutesToReserve).toBeCloseTo((reading.expected.ideal_gas_L - reserve.expected.ideal_gas_L) / 10, 0)

    const withZ = estimateSupply(
      { ...cylinder, compressibility: { atReading: nearestZ(201), atReserve: nearestZ(138), atReference: zReference } },
      { gaugePressure: 200, flowLPerMin: 10 },
    )
    const expectedRealMinutes = (reading.expected.real_gas_L - reserve.expected.real_gas_L) / 10
    expect(relativeError(withZ.minutesToReserve, expectedRealMinutes)).toBeLessThan(0.01)
    expect(withZ.minutesToReserve).toBeGreaterThan(ideal.minutesToReserve)
  })

  it('reads and reserves in bar; psi-factor cylinders in psi', () => {
    expect(pressureUnitFor({ method: 'metric', waterCapacityL: 10, reserveBar: 10 })).toBe('bar')
    expect(pressureUnitFor(psiCylinder(0.28))).toBe('psi')
  })
})

describe('readings at or below the reserve, and nonsense input', () => {
  it('a gauge below the reserve shows 0 minutes left, never a negative time', () => {
    const estimate = estimateSupply(psiCylinder(0.28), { gaugePressure: 150, flowLPerMin: 2 })
    expect(estimate).toMatchObject({ usableL: 0, minutesToReserve: 0, hoursToReserve: 0, atOrBelowReserve: true })
    expect(estimate.gasLeftL).toBeCloseTo(150 * 0.28, 12)
  })

  it('a metric cylinder exactly at its reserve is flagged with 0 minutes', () => {
    const cylinder: MetricCylinder = { method: 'metric', waterCapacityL: 50, reserveBar: 20 }
    expect(estimateSupply(cylinder, { gaugePressure: 20, flowLPerMin: 5 })).toMatchObject({
      minutesToReserve: 0,
      atOrBelowReserve: true,
    })
  })

  it.each([
    ['a flow of 0', psiCylinder(0.28), { gaugePressure: 1000, flowLPerMin: 0 }],
    ['a negative flow', psiCylinder(0.28), { gaugePressure: 1000, flowLPerMin: -1 }],
    ['a negative gauge reading', psiCylinder(0.28), { gaugePressure: -5, flowLPerMin: 2 }],
    ['a gauge reading that is not a number', psiCylinder(0.28), { gaugePressure: Number.NaN, flowLPerMin: 2 }],
    ['a cylinder factor of 0', psiCylinder(0), { gaugePressure: 1000, flowLPerMin: 2 }],
    ['a negative reserve', psiCylinder(0.28, -10), { gaugePressure: 1000, flowLPerMin: 2 }],
  ])('%s is refused', (_label, cylinder, reading) => {
    expect(() => estimateSupply(cylinder, reading)).toThrow(RangeError)
  })

  it('a compressibility factor of 0 or a water capacity of 0 is refused', () => {
    const reading = { gaugePressure: 150, flowLPerMin: 2 }
    const zeroZ: MetricCylinder = {
      method: 'metric',
      waterCapacityL: 10,
      reserveBar: 10,
      compressibility: { atReading: 0 },
    }
    const noCapacity: MetricCylinder = { method: 'metric', waterCapacityL: 0, reserveBar: 10 }
    expect(() => estimateSupply(zeroZ, reading)).toThrow(RangeError)
    expect(() => estimateSupply(noCapacity, reading)).toThrow(RangeError)
  })
})
