import { z } from 'zod'
import { text } from './text'
import { BandSchema } from './parameter'
import { CategorySchema, PrioritySchema } from './routine'
import { TaskStatusSchema, type Task } from './task'

export const BoardColumnPersonSchema = z.object({
  personId: z.number().int(),
  name: text(),
  role: text(),
  shifts: z.array(z.object({ start: text(), end: text(), kind: text() })),
  taskCount: z.number().int(),
  plannedMinutes: z.number().int(),
})
export type BoardColumnPerson = z.infer<typeof BoardColumnPersonSchema>

/** What many cards share: a routine's title, category, priority and length. */
export const BoardKindSchema = z.object({
  title: text(),
  category: CategorySchema,
  priority: PrioritySchema,
  durationMinutes: z.number().int(),
})

export const BoardTargetSchema = z.object({
  label: text(),
  tankId: z.number().int().nullable(),
  areaId: z.number().int().nullable(),
})

/**
 * One card as sent: what differs from card to card, with indexes into the day's `kinds` and
 * `targets`. Empty fields are left out, so a day of 6,000 cards stays near 500 kB of JSON.
 */
export const BoardCardWireSchema = z.object({
  id: z.number().int(),
  kind: z.number().int().nonnegative(),
  target: z.number().int().nonnegative(),
  /** Local "HH:mm" on the board's day. */
  time: text(),
  status: TaskStatusSchema,
  assignee: z.number().int().optional(),
  flag: BandSchema.optional(),
  held: text().optional(),
  version: z.number().int(),
})
export type BoardCardWire = z.infer<typeof BoardCardWireSchema>

/** GET /tasks/board: one day's cards, with each kind, target and person once. */
export const BoardWireSchema = z.object({
  date: text(),
  people: z.array(BoardColumnPersonSchema),
  kinds: z.array(BoardKindSchema),
  targets: z.array(BoardTargetSchema),
  cards: z.array(BoardCardWireSchema),
})
export type BoardWire = z.infer<typeof BoardWireSchema>

/** The same answer with the cards left unchecked, for a client that checks them a slice at a time (`BoardCardWireSchema`). */
export const BoardWireEnvelopeSchema = BoardWireSchema.extend({ cards: z.array(z.unknown()) })

/** A card as the board draws it; a full task (from a live event or a move) is one too. */
export type BoardCard = Pick<
  Task,
  | 'id'
  | 'title'
  | 'category'
  | 'priority'
  | 'durationMinutes'
  | 'targetLabel'
  | 'tankId'
  | 'areaId'
  | 'localDate'
  | 'localTime'
  | 'status'
  | 'assigneeId'
  | 'assigneeName'
  | 'flag'
  | 'heldReason'
  | 'version'
>

export interface Board {
  date: string
  people: BoardColumnPerson[]
  tasks: BoardCard[]
}

/** One wire card unfolded into a board card, given the day's kinds, targets and people. */
export function cardUnfolder(day: Pick<BoardWire, 'date' | 'people' | 'kinds' | 'targets'>): (card: BoardCardWire) => BoardCard {
  const names = new Map(day.people.map((p) => [p.personId, p.name]))
  return (c) => {
    const kind = day.kinds[c.kind]
    const target = day.targets[c.target]
    return {
      id: c.id,
      title: kind.title,
      category: kind.category,
      priority: kind.priority,
      durationMinutes: kind.durationMinutes,
      targetLabel: target.label,
      tankId: target.tankId,
      areaId: target.areaId,
      localDate: day.date,
      localTime: c.time,
      status: c.status,
      assigneeId: c.assignee ?? null,
      assigneeName: c.assignee === undefined ? null : (names.get(c.assignee) ?? null),
      flag: c.flag ?? null,
      heldReason: c.held ?? null,
      version: c.version,
    }
  }
}

/** The wire shape unfolded into cards, so the board and its cache patchers read one kind of object. */
export function unfoldBoard(wire: BoardWire): Board {
  return { date: wire.date, people: wire.people, tasks: wire.cards.map(cardUnfolder(wire)) }
}

export const CalendarDaySchema = z.object({
  date: text(),
  counts: z.object({ done: z.number().int(), open: z.number().int(), missed: z.number().int(), held: z.number().int(), skipped: z.number().int() }),
  byCategory: z.record(text(), z.number().int()),
  onShift: z.array(text()),
  onCall: z.array(text()),
  events: z.array(z.object({ id: z.number().int(), title: text(), kind: text() })),
})
export type CalendarDay = z.infer<typeof CalendarDaySchema>
