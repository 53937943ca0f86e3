import { describe, expect, test } from 'vitest'
import { impossibleReading } from '#shared/readings/judge-readings'
import { checkTypedReading } from '#shared/readings/typed-reading'

// Dissolved oxygen with invented limits; the physical range 0–30 mg/L is common practice for a DO probe.
const DO = { unit: 'mg/L', physicalMin: 0, physicalMax: 30, okMin: 5, okMax: null, criticalMin: 3, criticalMax: null }

describe('a reading typed on the round or copied from a paper sheet', () => {
  test('an empty field is empty, not zero', () => {
    expect(checkTypedReading('  ', DO)).toEqual({ state: 'empty' })
  })

  test('a decimal comma is read as a decimal point, and the value is banded against the limits', () => {
    expect(checkTypedReading('4,2', DO)).toEqual({ state: 'valid', value: 4.2, band: 'watch' })
    expect(checkTypedReading('2.9', DO)).toEqual({ state: 'valid', value: 2.9, band: 'critical' })
    expect(checkTypedReading('7', DO)).toEqual({ state: 'valid', value: 7, band: 'ok' })
  })

  test('text that is not a plain number is refused, exponents and hex included', () => {
    for (const raw of ['abc', '1e3', '0x10', '5..1', '-', '7 mg']) expect(checkTypedReading(raw, DO)).toEqual({ state: 'invalid', message: 'Enter a number' })
  })

  test('a value outside what the probe can read is refused with the possible range', () => {
    expect(checkTypedReading('31', DO)).toEqual({ state: 'invalid', message: 'Not possible: must be 0–30 mg/L' })
    expect(impossibleReading(-0.1, DO)).toBe('Not possible: must be 0–30 mg/L')
    expect(impossibleReading(30, DO)).toBeNull()
  })
})
