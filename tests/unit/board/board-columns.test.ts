import { describe, expect, test } from 'vitest'
import type { BoardCard } from '#shared/schemas/board'
import { applyMove, byTime } from '../../../src/api/tasks/board-cache'
import { byColumn, keepUnchanged } from '../../../src/features/board/utils/board-columns'

const ANA = 1
const BEN = 2

const card = (id: number, assigneeId: number | null, localTime: string): BoardCard => ({
  id,
  title: `Task ${id}`,
  category: 'feeding',
  priority: 'routine',
  durationMinutes: 10,
  targetLabel: `NUR-T0${id}`,
  tankId: id,
  areaId: 1,
  localDate: '2026-12-07',
  localTime,
  status: 'open',
  assigneeId,
  assigneeName: assigneeId === ANA ? 'Ana' : assigneeId === BEN ? 'Ben' : null,
  flag: null,
  heldReason: null,
  version: 1,
})

const day = {
  date: '2026-12-07',
  people: [],
  tasks: [card(1, null, '07:00'), card(2, ANA, '07:30'), card(3, ANA, '08:00'), card(4, BEN, '07:15'), card(5, BEN, '09:00')],
}
const all = (tasks: BoardCard[]) => byColumn(tasks, new Set(tasks))
const ids = (cards: BoardCard[] | undefined) => cards?.map((t) => t.id)

// The board's columns are memoised on their card lists: a list that is new draws its column again.
describe('board columns', () => {
  test('each column holds its cards in the day order, and the filters decide which are shown', () => {
    const sorted = [...day.tasks].sort(byTime)
    const columns = byColumn(sorted, new Set(sorted.filter((t) => t.localTime < '08:00')))
    expect(ids(columns.get(null)?.all)).toEqual([1])
    expect(ids(columns.get(ANA)?.all)).toEqual([2, 3])
    expect(ids(columns.get(ANA)?.shown)).toEqual([2])
    expect(ids(columns.get(BEN)?.all)).toEqual([4, 5])
    expect(ids(columns.get(BEN)?.shown)).toEqual([4])
  })

  test("a card moved from Ana to Unassigned gives new lists to those two columns and leaves Ben's column as it was", () => {
    const before = all([...day.tasks].sort(byTime))
    const moved = applyMove(day, new Set([3]), { assigneeId: null, assigneeName: null })
    const after = keepUnchanged(all([...moved.tasks].sort(byTime)), before)

    expect(after.get(BEN)).toBe(before.get(BEN))
    expect(after.get(ANA)).not.toBe(before.get(ANA))
    expect(ids(after.get(ANA)?.all)).toEqual([2])
    expect(after.get(null)).not.toBe(before.get(null))
    expect(ids(after.get(null)?.all)).toEqual([1, 3])
  })

  test('a filter that hides cards keeps every column’s full list (and its totals) but gives new shown lists where they changed', () => {
    const sorted = [...day.tasks].sort(byTime)
    const before = all(sorted)
    const after = keepUnchanged(byColumn(sorted, new Set(sorted.filter((t) => t.id !== 5))), before)

    expect(after.get(BEN)?.all).toBe(before.get(BEN)?.all)
    expect(ids(after.get(BEN)?.shown)).toEqual([4])
    expect(after.get(ANA)).toBe(before.get(ANA))
  })

  test('a card that changed in place (a new version from a live update) counts as a change to its column', () => {
    const before = all(day.tasks)
    const changed = day.tasks.map((t) => (t.id === 4 ? { ...t, status: 'done' as const, version: 2 } : t))
    const after = keepUnchanged(all(changed), before)

    expect(after.get(BEN)).not.toBe(before.get(BEN))
    expect(after.get(BEN)?.all[0].status).toBe('done')
    expect(after.get(ANA)).toBe(before.get(ANA))
  })
})
