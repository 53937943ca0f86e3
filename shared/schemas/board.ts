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
 * One card: what differs from card to card, with indexes into the day's `kinds` and `targets`.
 * Empty fields are left out. The wire carries cards as columns (`BoardCardColumnsSchema`).
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

/**
 * A day's cards as columns: position i of every list is card i. Field names once instead of
 * 6,000 times take the day from about 580 kB of JSON to under half, which is what the server
 * writes and compresses and the phone unpacks (record 16l). Rare fields go by position.
 */
export const BoardCardColumnsSchema = z.object({
  id: z.array(z.number().int()),
  kind: z.array(z.number().int().nonnegative()),
  target: z.array(z.number().int().nonnegative()),
  time: z.array(text()),
  status: z.array(TaskStatusSchema),
  version: z.array(z.number().int()),
  /** 0 where nobody holds the card (ids start at 1). */
  assignee: z.array(z.number().int().nonnegative()),
  /** Card position → its flag, for the few flagged cards. */
  flag: z.record(text(), BandSchema),
  /** Card position → why it is held. */
  held: z.record(text(), text()),
})
export type BoardCardColumns = z.infer<typeof BoardCardColumnsSchema>

const NOBODY = 0

/** Empty columns, for the server to fill card by card with `pushCard`. */
export function emptyColumns(): BoardCardColumns {
  return { id: [], kind: [], target: [], time: [], status: [], version: [], assignee: [], flag: {}, held: {} }
}

export function pushCard(columns: BoardCardColumns, card: BoardCardWire) {
  const at = columns.id.push(card.id) - 1
  columns.kind.push(card.kind)
  columns.target.push(card.target)
  columns.time.push(card.time)
  columns.status.push(card.status)
  columns.version.push(card.version)
  columns.assignee.push(card.assignee ?? NOBODY)
  if (card.flag !== undefined) columns.flag[at] = card.flag
  if (card.held !== undefined) columns.held[at] = card.held
}

/** The columns as they arrive, unchecked: a client checks each card as it reads it (`cardAt`). */
export const BoardCardColumnsEnvelopeSchema = z
  .object({
    id: z.array(z.unknown()),
    kind: z.array(z.unknown()),
    target: z.array(z.unknown()),
    time: z.array(z.unknown()),
    status: z.array(z.unknown()),
    version: z.array(z.unknown()),
    assignee: z.array(z.unknown()),
    flag: z.record(text(), z.unknown()),
    held: z.record(text(), z.unknown()),
  })
  .refine((c) => [c.kind, c.target, c.time, c.status, c.version, c.assignee].every((list) => list.length === c.id.length), {
    message: 'Every column holds one value per card',
  })
export type BoardCardColumnsEnvelope = z.infer<typeof BoardCardColumnsEnvelopeSchema>

/** Card i read out of the columns, not yet checked (check it with `BoardCardWireSchema`). */
export function cardAt(columns: BoardCardColumnsEnvelope, i: number): Record<string, unknown> {
  const card: Record<string, unknown> = {
    id: columns.id[i],
    kind: columns.kind[i],
    target: columns.target[i],
    time: columns.time[i],
    status: columns.status[i],
    version: columns.version[i],
  }
  if (columns.assignee[i] !== NOBODY) card.assignee = columns.assignee[i]
  if (i in columns.flag) card.flag = columns.flag[i]
  if (i in columns.held) card.held = columns.held[i]
  return card
}

/** GET /tasks/board: one day's cards, with each kind, target and person once. */
export const BoardWireSchema = z.object({
  date: text(),
  people: z.array(BoardColumnPersonSchema),
  kinds: z.array(BoardKindSchema),
  targets: z.array(BoardTargetSchema),
  cards: BoardCardColumnsSchema,
})
export type BoardWire = z.infer<typeof BoardWireSchema>

/** The same answer with the cards left unchecked, for a client that checks them a card at a time. */
export const BoardWireEnvelopeSchema = BoardWireSchema.extend({ cards: BoardCardColumnsEnvelopeSchema })

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
  return { date: wire.date, people: wire.people, tasks: wireCards(wire.cards).map(cardUnfolder(wire)) }
}

/** Every card read out of checked columns, in order. */
export function wireCards(columns: BoardCardColumns): BoardCardWire[] {
  return columns.id.map((_, i) => BoardCardWireSchema.parse(cardAt(columns, i)))
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
