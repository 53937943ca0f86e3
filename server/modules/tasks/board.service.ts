import { emptyColumns, pushCard, type BoardCardWire, type BoardColumnPerson, type BoardWire } from '#shared/schemas/board'
import type { Band } from '#shared/schemas/parameter'
import type { Category, TargetKind } from '#shared/schemas/routine'
import type { Task, TaskStatus } from '#shared/schemas/task'
import { db } from '../../db/data-source'
import { loadCatalogue, targetLabel } from './targets'

interface CardRow {
  id: number
  title: string
  category: Category
  priority: Task['priority']
  durationMinutes: number
  targetKind: TargetKind
  targetId: number
  tankId: number | null
  areaId: number | null
  time: string
  status: TaskStatus
  assigneeId: number | null
  flag: Band | null
  heldReason: string | null
  version: number
  tankLabel: string | null
}

// Only the columns a card draws: a day can hold 6,000 tasks, and each unused column costs parsing.
// A tank's label comes with the row; other targets (rare on a busy day) need the catalogue.
const CARDS_SQL = `SELECT t.id, t.title, t.category, t.priority, t.durationMinutes, t.targetKind, t.targetId, t.tankId, t.areaId,
  SUBSTRING(t.localStart, 12, 5) AS time, t.status, t.assigneeId, t.flag, t.heldReason, t.version,
  CONCAT(k.code, ' · ', k.name) AS tankLabel
  FROM tasks t LEFT JOIN tanks k ON k.id = t.targetId AND t.targetKind IN ('tank', 'area_tanks')
  WHERE t.localDate = ? ORDER BY t.dueAt, t.id`

const SHIFTS_SQL =
  'SELECT s.personId, s.`start`, s.`end`, s.kind, p.name, p.role FROM shifts s JOIN people p ON p.id = s.personId ' +
  'WHERE s.date = ? ORDER BY s.`start`, s.id'

interface ShiftRow {
  personId: number
  start: string
  end: string
  kind: string
  name: string
  role: string
}

/** Gives each distinct value an index in `list`, the first time it is seen. */
function indexer<T>(list: T[]) {
  const seen = new Map<string, number>()
  return (key: string, make: () => T) => {
    let i = seen.get(key)
    if (i === undefined) {
      i = list.push(make()) - 1
      seen.set(key, i)
    }
    return i
  }
}

/** One day's cards and a column per person on shift (or holding tasks) that day. */
export async function getBoard(date: string): Promise<BoardWire> {
  const [rows, shifts] = await Promise.all([db().query(CARDS_SQL, [date]) as Promise<CardRow[]>, db().query(SHIFTS_SQL, [date]) as Promise<ShiftRow[]>])
  const cat = rows.some((r) => r.tankLabel === null) ? await loadCatalogue() : null
  const kinds: BoardWire['kinds'] = []
  const targets: BoardWire['targets'] = []
  const kindOf = indexer(kinds)
  const targetOf = indexer(targets)
  const load = new Map<number, { taskCount: number; plannedMinutes: number }>()
  const cards = emptyColumns()
  for (const r of rows) {
    const card: BoardCardWire = {
      id: r.id,
      kind: kindOf(`${r.title}\u0000${r.category}\u0000${r.priority}\u0000${r.durationMinutes}`, () => ({
        title: r.title,
        category: r.category,
        priority: r.priority,
        durationMinutes: r.durationMinutes,
      })),
      target: targetOf(`${r.targetKind}:${r.targetId}:${r.tankId}:${r.areaId}`, () => ({
        label: r.tankLabel ?? targetLabel(r.targetKind, r.targetId, cat!),
        tankId: r.tankId,
        areaId: r.areaId,
      })),
      time: r.time,
      status: r.status,
      version: r.version,
    }
    if (r.assigneeId !== null) {
      card.assignee = r.assigneeId
      const l = load.get(r.assigneeId) ?? { taskCount: 0, plannedMinutes: 0 }
      l.taskCount++
      l.plannedMinutes += r.durationMinutes
      load.set(r.assigneeId, l)
    }
    if (r.flag !== null) card.flag = r.flag
    if (r.heldReason !== null) card.held = r.heldReason
    pushCard(cards, card)
  }
  return { date, people: await columns(shifts, load), kinds, targets, cards }
}

/** People on shift, in shift order, then anyone else holding tasks that day. */
async function columns(shifts: ShiftRow[], load: Map<number, { taskCount: number; plannedMinutes: number }>): Promise<BoardColumnPerson[]> {
  const byPerson = new Map<number, BoardColumnPerson>()
  const column = (personId: number, name: string, role: string): BoardColumnPerson => ({
    personId,
    name,
    role,
    shifts: [],
    taskCount: load.get(personId)?.taskCount ?? 0,
    plannedMinutes: load.get(personId)?.plannedMinutes ?? 0,
  })
  for (const s of shifts) {
    const c = byPerson.get(s.personId) ?? column(s.personId, s.name, s.role)
    c.shifts.push({ start: s.start, end: s.end, kind: s.kind })
    byPerson.set(s.personId, c)
  }
  const offShift = [...load.keys()].filter((id) => !byPerson.has(id))
  if (offShift.length) {
    const people = (await db().query(`SELECT id, name, role FROM people WHERE id IN (${offShift.map(() => '?').join(',')})`, offShift)) as Array<{
      id: number
      name: string
      role: string
    }>
    for (const p of people) byPerson.set(p.id, column(p.id, p.name, p.role))
  }
  return [...byPerson.values()].sort((a, b) => (a.shifts[0]?.start ?? '99').localeCompare(b.shifts[0]?.start ?? '99') || a.name.localeCompare(b.name))
}
