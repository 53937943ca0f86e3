import { describe, expect, test } from 'vitest'
import { planRoutineTasks } from '#server/modules/scheduling/materialiser'
import type { Catalogue } from '#server/modules/tasks/targets'
import type { Routine } from '#shared/schemas/routine'

// A facility in Berlin: clocks go forward on 2026-03-29 and back on 2026-10-25 (EU rule, common knowledge).
const catalogue = (timeZone: string): Catalogue => ({
  facility: {
    id: 1,
    name: 'Test station',
    timeZone,
    handoverTime: '08:00',
    quarantineDays: 30,
    arrivalTempDiffLimitC: 2,
    minOxygenHours: 12,
    defaultLadderId: null,
    fastLadderId: null,
    digestTime: '07:00',
  },
  areas: new Map([[1, { id: 1, code: 'A', name: 'Hall', roundOrder: 1, quarantine: false }]]),
  systems: new Map(),
  tanks: new Map([
    [1, { id: 1, code: 'T1', name: 'One', areaId: 1, systemId: null, volumeL: 100, kind: 'tank' as const, inUse: true }],
    [2, { id: 2, code: 'T2', name: 'Two', areaId: 1, systemId: null, volumeL: 100, kind: 'tank' as const, inUse: false }],
  ]),
  equipment: new Map(),
  batches: new Map(),
})

const routine = (overrides: Partial<Routine> = {}): Routine => ({
  id: 7,
  name: 'Morning feed',
  category: 'feeding',
  instructions: '',
  targetKind: 'tank',
  targetIds: [1, 2],
  onlyInUse: true,
  rrule: 'FREQ=WEEKLY;BYDAY=MO,WE,FR',
  dtstart: '2026-03-02T10:15:00',
  durationMinutes: 5,
  windowBeforeMinutes: 30,
  graceMinutes: 60,
  priority: 'routine',
  assigneeRule: { kind: 'none' },
  requiredReadings: ['do_mgL'],
  activeFrom: null,
  activeTo: null,
  paused: false,
  skipDates: [],
  ladderId: null,
  planningError: null,
  version: 1,
  ...overrides,
})

describe('planning a routine into tasks', () => {
  test('when a Mon/Wed/Fri 10:15 routine crosses the spring change in Berlin, then it stays 10:15 local and the UTC time moves an hour', () => {
    const rows = planRoutineTasks(routine(), catalogue('Europe/Berlin'), new Date('2026-03-25T00:00:00Z'), new Date('2026-04-02T00:00:00Z'))
    expect(rows.map((r) => r.localStart)).toEqual(['2026-03-25T10:15:00', '2026-03-27T10:15:00', '2026-03-30T10:15:00', '2026-04-01T10:15:00'])
    expect(rows.map((r) => r.dueAt!.toISOString())).toEqual([
      '2026-03-25T09:15:00.000Z',
      '2026-03-27T09:15:00.000Z',
      '2026-03-30T08:15:00.000Z',
      '2026-04-01T08:15:00.000Z',
    ])
  })

  test('when only tanks in use are wanted, then the empty tank gets no tasks', () => {
    const rows = planRoutineTasks(routine(), catalogue('Europe/Berlin'), new Date('2026-03-25T00:00:00Z'), new Date('2026-03-26T00:00:00Z'))
    expect(rows.map((r) => r.tankId)).toEqual([1])
  })

  test('when a skip date and an active window are set, then occurrences outside them are left out', () => {
    const rows = planRoutineTasks(
      routine({ skipDates: ['2026-03-27'], activeTo: '2026-03-30' }),
      catalogue('Europe/Berlin'),
      new Date('2026-03-25T00:00:00Z'),
      new Date('2026-04-10T00:00:00Z'),
    )
    expect(rows.map((r) => r.localDate)).toEqual(['2026-03-25', '2026-03-30'])
  })

  test('when the window and grace are set, then each task opens before and counts as missed after them', () => {
    const [row] = planRoutineTasks(
      routine({ windowBeforeMinutes: 15, graceMinutes: 45 }),
      catalogue('Australia/Brisbane'),
      new Date('2026-03-25T00:00:00Z'),
      new Date('2026-03-26T00:00:00Z'),
    )
    expect(row.dueAt!.toISOString()).toBe('2026-03-25T00:15:00.000Z') // Brisbane is UTC+10 all year
    expect(row.windowStartAt!.toISOString()).toBe('2026-03-25T00:00:00.000Z')
    expect(row.graceUntil!.toISOString()).toBe('2026-03-25T01:00:00.000Z')
  })
})
