import { describe, expect, it } from 'vitest'
import { expandRule } from '#shared/schedule/expand-rule'
import { dstScenarios } from './support/dst-scenarios'

// Expected values and their sources are in ./support/dst-scenarios.ts
describe('expandRule across daylight-saving changes', () => {
  it.each(dstScenarios)('$story', ({ input, expected }) => {
    expect(expandRule(input)).toEqual(expected)
  })

  it('when a daily 07:30 feed runs for a whole year in Sydney, then every occurrence is 07:30 local and only two UTC times of day appear', () => {
    const occurrences = expandRule({ rrule: 'FREQ=DAILY;COUNT=365', dtstart: '2025-01-01T07:30:00', tzid: 'Australia/Sydney' })
    expect(occurrences).toHaveLength(365)
    expect(new Set(occurrences.map((occurrence) => occurrence.local.slice(11)))).toEqual(new Set(['07:30:00']))
    // common practice / computed by hand: 07:30 AEDT (+11) is 20:30Z, 07:30 AEST (+10) is 21:30Z
    expect(new Set(occurrences.map((occurrence) => occurrence.utc.slice(11)))).toEqual(new Set(['20:30:00Z', '21:30:00Z']))
  })
})
