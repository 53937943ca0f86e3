import { describe, expect, test } from 'vitest'
import { fullDay, longDay, shortWeekday } from '../../../src/features/board/utils/board-dates'

// The board names its days by hand (building Intl formatters cost a phone's first render);
// the names must stay what the British English formatter says, day for day.
const intl = (iso: string, options: Intl.DateTimeFormatOptions) =>
  new Intl.DateTimeFormat('en-GB', { ...options, timeZone: 'UTC' }).format(new Date(`${iso}T00:00:00Z`))

const daysOf = (from: string, count: number) =>
  Array.from({ length: count }, (_, i) => new Date(Date.parse(`${from}T00:00:00Z`) + i * 86_400_000).toISOString().slice(0, 10))

describe('board day names', () => {
  test('every day of three years, a leap year among them, reads as the en-GB formatter writes it', () => {
    for (const iso of daysOf('2024-01-01', 3 * 366)) {
      expect(longDay(iso)).toBe(intl(iso, { weekday: 'long', day: 'numeric', month: 'long' }))
      expect(fullDay(iso)).toBe(intl(iso, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }))
      expect(shortWeekday(iso)).toBe(intl(iso, { weekday: 'short' }))
    }
  })
})
