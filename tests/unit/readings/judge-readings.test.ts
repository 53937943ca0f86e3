import { describe, expect, test } from 'vitest'
import { judgeReadings, type ReadingRule } from '#shared/readings/judge-readings'
import { judgeTypedReadings } from '#shared/readings/typed-reading'

// Invented limits; the physical ranges (DO 0–30 mg/L, −2–45 °C, pH 0–14) are common practice for the probes.
const RULES: Record<string, ReadingRule & { key: string }> = {
  do_mgL: { key: 'do_mgL', name: 'Dissolved oxygen', unit: 'mg/L', physicalMin: 0, physicalMax: 30, okMin: 5, okMax: 10.5, criticalMin: 4, criticalMax: null },
  temp_c: { key: 'temp_c', name: 'Temperature', unit: '°C', physicalMin: -2, physicalMax: 45, okMin: 26, okMax: 31, criticalMin: 24, criticalMax: 33 },
  ph: { key: 'ph', name: 'pH', unit: 'pH', physicalMin: 0, physicalMax: 14, okMin: 7, okMax: 8.2, criticalMin: 6.8, criticalMax: 8.5 },
  do_pct: {
    key: 'do_pct',
    name: 'DO saturation',
    unit: '% sat',
    physicalMin: 0,
    physicalMax: 400,
    derived: true,
    okMin: 70,
    okMax: 140,
    criticalMin: 55,
    criticalMax: null,
  },
}
const ruleFor = (key: string) => RULES[key]

describe('one judgement of a set of readings', () => {
  test('each reading is banded, the derived saturation with them, and the flag is the worst band', () => {
    const normal = judgeReadings({ do_mgL: 6.8, temp_c: 28.4 }, ruleFor, { required: ['do_mgL', 'temp_c'] })
    expect(normal.problems).toEqual({})
    expect(normal.flag).toBe('ok')
    expect(normal.readings.map((r) => [r.parameterKey, r.band, r.derived])).toEqual([
      ['do_mgL', 'ok', false],
      ['temp_c', 'ok', false],
      ['do_pct', 'ok', true],
    ])

    expect(judgeReadings({ do_mgL: 4.5, temp_c: 28 }, ruleFor).flag).toBe('watch')
    const critical = judgeReadings({ do_mgL: 3.1, temp_c: 28 }, ruleFor)
    expect(critical.flag).toBe('critical')
    expect(critical.readings.filter((r) => r.band === 'critical').map((r) => r.parameterKey)).toEqual(['do_mgL', 'do_pct'])
  })

  test('a missing, unknown, derived or impossible reading is a problem, worded for a message and for beside the field, and nothing is judged', () => {
    const judged = judgeReadings({ ph: 15, do_pct: 90, colour: 3 }, ruleFor, { required: ['temp_c'] })
    expect(judged.readings).toEqual([])
    expect(judged.problems).toEqual({
      temp_c: { kind: 'missing', message: 'Temperature is required', hint: 'Required' },
      ph: { kind: 'impossible', message: 'pH 15 pH is impossible (must be 0–14)', hint: 'Not possible: must be 0–14 pH' },
      do_pct: { kind: 'derived', message: 'DO saturation is worked out by Roundtide, not typed in', hint: 'Worked out by Roundtide, not typed in' },
      colour: { kind: 'unknown', message: 'Unknown reading', hint: 'Unknown reading' },
    })
  })

  test('a form judges its typed text the same way: numbers first, then the set', () => {
    const typed = judgeTypedReadings({ do_mgL: '3,1', temp_c: '', ph: 'seven' }, [RULES.do_mgL, RULES.temp_c, RULES.ph])
    expect(typed.values).toEqual({ do_mgL: 3.1 })
    expect(typed.empty).toEqual(['temp_c'])
    expect(typed.errors).toEqual({ ph: 'Enter a number' })
    expect(typed.judgement.flag).toBe('critical')
    expect(judgeTypedReadings({ do_mgL: '31' }, [RULES.do_mgL]).errors).toEqual({ do_mgL: 'Not possible: must be 0–30 mg/L' })
  })
})
