import Papa from 'papaparse'
import { describe, expect, test } from 'vitest'
import { neutraliseCell, toCsv } from '#server/lib/csv'
import { complianceRows, isoWeek } from '#shared/reports/compliance'

// An invented week of nine tasks for two categories, counted by hand.
const TASKS = [
  { localDate: '2026-06-01', status: 'done', lateMinutes: null, group: 'welfare' },
  { localDate: '2026-06-01', status: 'done', lateMinutes: 12, group: 'welfare' },
  { localDate: '2026-06-01', status: 'missed', lateMinutes: null, group: 'welfare' },
  { localDate: '2026-06-01', status: 'held', lateMinutes: null, group: 'feeding' },
  { localDate: '2026-06-01', status: 'done', lateMinutes: 0, group: 'feeding' },
  { localDate: '2026-06-02', status: 'skipped', lateMinutes: null, group: 'welfare' },
  { localDate: '2026-06-02', status: 'done', lateMinutes: null, group: 'welfare' },
  { localDate: '2026-06-02', status: 'open', lateMinutes: null, group: 'welfare' },
  { localDate: '2026-06-08', status: 'done', lateMinutes: null, group: 'welfare' },
]

describe('compliance arithmetic', () => {
  test('per day and group: on time, late, missed, skipped, held and open are counted apart', () => {
    const rows = complianceRows(TASKS, 'day')
    expect(rows.find((r) => r.period === '2026-06-01' && r.group === 'welfare')).toMatchObject({
      total: 3,
      onTime: 1,
      late: 1,
      missed: 1,
      skipped: 0,
      held: 0,
      open: 0,
      onTimeRate: 0.333,
    })
    expect(rows.find((r) => r.period === '2026-06-01' && r.group === 'feeding')).toMatchObject({ total: 2, onTime: 1, held: 1, onTimeRate: 1 })
    expect(rows.find((r) => r.period === '2026-06-02' && r.group === 'welfare')).toMatchObject({ total: 3, onTime: 1, skipped: 1, open: 1, onTimeRate: 0.5 })
  })

  test('per ISO week: 1–7 June 2026 is week 23, 8 June starts week 24', () => {
    expect(isoWeek('2026-06-01')).toBe('2026-W23')
    expect(isoWeek('2026-06-08')).toBe('2026-W24')
    const rows = complianceRows(TASKS, 'week')
    expect(rows.find((r) => r.period === '2026-W23' && r.group === 'welfare')).toMatchObject({
      total: 6,
      onTime: 2,
      late: 1,
      missed: 1,
      skipped: 1,
      open: 1,
      onTimeRate: 0.4,
    })
    expect(rows.find((r) => r.period === '2026-W24')).toMatchObject({ total: 1, onTime: 1, onTimeRate: 1 })
  })

  test('a group with only held tasks has no rate rather than 0 %', () => {
    expect(complianceRows([{ localDate: '2026-06-01', status: 'held', lateMinutes: null, group: 'feeding' }], 'day')[0].onTimeRate).toBeNull()
  })
})

describe('CSV export', () => {
  test('commas, quotes and newlines survive a round trip', () => {
    const rows = [{ a: 'Bin, spare', b: 'said "hi"', c: 'two\nlines' }]
    const parsed = Papa.parse<string[]>(toCsv(rows, ['a', 'b', 'c']), { skipEmptyLines: true }).data
    expect(parsed).toEqual([
      ['a', 'b', 'c'],
      ['Bin, spare', 'said "hi"', 'two\nlines'],
    ])
  })

  test.each(['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\tx'])('a cell starting like a formula (%j) is kept as text', (text) => {
    expect(neutraliseCell(text)).toBe(`'${text}`)
  })

  test('numbers stay numbers, including negative readings', () => {
    expect(neutraliseCell(-1.5)).toBe(-1.5)
    expect(toCsv([{ v: -1.5 }], ['v'])).toBe('v\r\n-1.5')
  })
})
