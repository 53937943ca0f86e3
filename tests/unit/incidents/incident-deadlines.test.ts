import { describe, expect, test } from 'vitest'
import { deadlineStatuses, nextDeadline } from '#shared/incidents/deadlines'

const HOUR = 3_600_000
const noticed = Date.UTC(2026, 11, 1, 8)
const at = (hours: number) => new Date(noticed + hours * HOUR).toISOString()
// The facility's defaults: welfare officer 24 h, committee 72 h, full report 7 d (common practice; local codes decide).
const incident = (extra: Partial<Parameters<typeof deadlineStatuses>[0]> = {}) => ({
  status: 'open' as const,
  told: [],
  welfareNotifiedAt: null,
  welfareDueAt: at(24),
  committeeDueAt: at(72),
  reportDueAt: at(168),
  reportedAt: null,
  closedAt: null,
  ...extra,
})

describe('an incident’s three deadlines', () => {
  test('while nothing is done they run, then turn overdue once their hour passes', () => {
    const states = (hours: number) => deadlineStatuses(incident(), new Date(noticed + hours * HOUR)).map((d) => d.state)
    expect(states(1)).toEqual(['due', 'due', 'due'])
    expect(states(30)).toEqual(['overdue', 'due', 'due'])
    expect(states(200)).toEqual(['overdue', 'overdue', 'overdue'])
  })

  test('the first person told answers the welfare deadline; reporting and closing answer the others, late when after the hour', () => {
    const done = incident({
      status: 'closed',
      told: [
        { who: 'Committee secretary', at: at(40) },
        { who: 'Welfare officer', at: at(3) },
      ],
      reportedAt: at(80),
      closedAt: at(100),
    })
    const [welfare, committee, report] = deadlineStatuses(done, new Date(noticed + 300 * HOUR))
    expect(welfare).toMatchObject({ state: 'met', doneAt: at(3) })
    expect(committee).toMatchObject({ state: 'late', doneAt: at(80) })
    expect(report).toMatchObject({ state: 'met', doneAt: at(100) })
  })

  test('a dismissed proposal has no deadlines, and the list shows the overdue one before one still running', () => {
    expect(deadlineStatuses(incident({ status: 'dismissed' }), new Date(noticed + 100 * HOUR)).map((d) => d.state)).toEqual([
      'not_needed',
      'not_needed',
      'not_needed',
    ])
    const told = incident({ told: [{ who: 'Welfare officer', at: at(2) }] })
    expect(nextDeadline(deadlineStatuses(told, new Date(noticed + 80 * HOUR)))?.key).toBe('committee')
    expect(nextDeadline(deadlineStatuses(told, new Date(noticed + 10 * HOUR)))?.key).toBe('committee')
    expect(nextDeadline(deadlineStatuses(incident(), new Date(noticed + 10 * HOUR)))?.key).toBe('welfare')
  })
})
