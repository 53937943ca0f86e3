import { describe, expect, test } from 'vitest'
import { compareWater } from '#shared/arrival/compare-water'
import { stepOccurrences } from '#shared/playbooks/step-times'

describe('playbook step times', () => {
  const at = (step: Partial<Parameters<typeof stepOccurrences>[0]>, start = '2026-03-28T09:30:00', zone = 'Europe/Berlin') =>
    stepOccurrences({ dayOffset: 0, time: null, minutesOffset: 0, repeatDays: 1, ...step }, start, zone).map((o) => o.local)

  test('"−1 day 14:00" falls on the day before at 14:00 local', () => {
    expect(at({ dayOffset: -1, time: '14:00' })).toEqual(['2026-03-27T14:00:00'])
  })

  test('"+10 min" follows the event start', () => {
    expect(at({ minutesOffset: 10 })).toEqual(['2026-03-28T09:40:00'])
  })

  test('"daily for 3 days at 09:45" stays 09:45 local across the spring change in Berlin (2026-03-29)', () => {
    const occ = stepOccurrences({ dayOffset: 1, time: '09:45', minutesOffset: 0, repeatDays: 3 }, '2026-03-28T09:30:00', 'Europe/Berlin')
    expect(occ.map((o) => o.local)).toEqual(['2026-03-29T09:45:00', '2026-03-30T09:45:00', '2026-03-31T09:45:00'])
    expect(occ.map((o) => o.utc.toISOString())).toEqual(['2026-03-29T07:45:00.000Z', '2026-03-30T07:45:00.000Z', '2026-03-31T07:45:00.000Z'])
  })
})

describe('transport box against receiving water (common practice: pH within 0.5, temperature within the facility limit)', () => {
  test('a close match gives no warnings', () => {
    expect(compareWater({ tempC: 27.5, pH: 7.6, doMgL: 8 }, { tempC: 28, pH: 7.8 }, 2).warnings).toEqual([])
  })

  test('a 3.5 °C and 0.7 pH difference gives both warnings with guidance', () => {
    const r = compareWater({ tempC: 24.5, pH: 7.2 }, { tempC: 28, pH: 7.9 }, 2)
    expect(r.tempDifferenceC).toBe(-3.5)
    expect(r.pHDifference).toBe(-0.7)
    expect(r.warnings[0]).toMatch(/temper gradually/)
    expect(r.warnings[1]).toMatch(/ammonia/)
  })
})
