import { describe, expect, test } from 'vitest'
import { coverageWarnings, type CoverageInput } from '#shared/roster/coverage'
import { planRotation } from '#shared/roster/rotation'

describe('on-call rotation', () => {
  test.each([2, 3, 4, 5, 7])('over 8 weeks with %i eligible people, weekend counts differ by at most one', (people) => {
    const ids = Array.from({ length: people }, (_, i) => i + 1)
    const plan = planRotation(ids, 8)
    const counts = ids.map((id) => plan.filter((p) => p === id).length)
    expect(plan).toHaveLength(8)
    expect(Math.max(...counts) - Math.min(...counts)).toBeLessThanOrEqual(1)
    expect(counts.reduce((a, b) => a + b, 0)).toBe(8)
  })

  test('nobody holds two weekends in a row while someone else is free', () => {
    const plan = planRotation([10, 20, 30], 9)
    for (let i = 1; i < plan.length; i++) expect(plan[i]).not.toBe(plan[i - 1])
  })

  test('a rotation with nobody in it is refused', () => {
    expect(() => planRotation([], 4)).toThrow(/at least one person/)
  })
})

const H = 3_600_000
const day0 = Date.UTC(2026, 5, 1) // a facility day as [00:00, 24:00) in UTC for simplicity
const base = (over: Partial<CoverageInput> = {}): CoverageInput => ({
  dates: ['2026-06-01'],
  shifts: [{ id: 1, personId: 1, personName: 'Kai', date: '2026-06-01', start: '07:00', end: '15:00' }],
  duties: [{ personId: 2, startsAt: day0 - H, endsAt: day0 + 25 * H }],
  dayRange: () => [day0, day0 + 24 * H] as const,
  tasks: [{ id: 9, date: '2026-06-01', time: '07:30', title: 'Morning check', priority: 'welfare_critical', assigneeId: 1, assigneeName: 'Kai' }],
  ...over,
})

describe('coverage warnings', () => {
  test('a well-covered day gives no warnings', () => {
    expect(coverageWarnings(base())).toEqual([])
  })

  test('a day with tasks and nobody on shift is reported', () => {
    const w = coverageWarnings(base({ shifts: [] }))
    expect(w.map((x) => x.kind)).toContain('tasks_without_shift')
  })

  test('a gap in on-call duty is reported with its length', () => {
    const w = coverageWarnings(base({ duties: [{ personId: 2, startsAt: day0 + 8 * H, endsAt: day0 + 25 * H }] }))
    expect(w.find((x) => x.kind === 'no_one_on_call')?.message).toMatch(/8 h/)
  })

  test('a person rostered twice at overlapping times is reported; back-to-back shifts are not', () => {
    const overlapping = coverageWarnings(
      base({ shifts: [...base().shifts, { id: 2, personId: 1, personName: 'Kai', date: '2026-06-01', start: '14:00', end: '22:00' }] }),
    )
    expect(overlapping.map((x) => x.kind)).toContain('double_booked')
    const backToBack = coverageWarnings(
      base({ shifts: [...base().shifts, { id: 2, personId: 1, personName: 'Kai', date: '2026-06-01', start: '15:00', end: '22:00' }] }),
    )
    expect(backToBack.map((x) => x.kind)).not.toContain('double_booked')
  })

  test('a welfare-critical task given to someone not on shift at its time is reported', () => {
    const w = coverageWarnings(
      base({ tasks: [{ id: 9, date: '2026-06-01', time: '17:30', title: 'Evening check', priority: 'welfare_critical', assigneeId: 1, assigneeName: 'Kai' }] }),
    )
    expect(w.find((x) => x.kind === 'welfare_task_off_shift')).toMatchObject({ taskId: 9, personId: 1 })
  })

  test('a night shift that runs past midnight covers a task at 02:00', () => {
    const w = coverageWarnings(
      base({
        shifts: [{ id: 1, personId: 1, personName: 'Kai', date: '2026-06-01', start: '22:00', end: '06:00' }],
        tasks: [{ id: 9, date: '2026-06-01', time: '23:30', title: 'Night check', priority: 'welfare_critical', assigneeId: 1, assigneeName: 'Kai' }],
      }),
    )
    expect(w.map((x) => x.kind)).not.toContain('welfare_task_off_shift')
  })
})
