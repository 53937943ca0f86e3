import { z } from 'zod'
import { TaskSchema } from './task'

export const BoardColumnPersonSchema = z.object({
  personId: z.number().int(),
  name: z.string(),
  role: z.string(),
  shifts: z.array(z.object({ start: z.string(), end: z.string(), kind: z.string() })),
  taskCount: z.number().int(),
  plannedMinutes: z.number().int(),
})
export type BoardColumnPerson = z.infer<typeof BoardColumnPersonSchema>

export const BoardSchema = z.object({
  date: z.string(),
  people: z.array(BoardColumnPersonSchema),
  tasks: z.array(TaskSchema),
})
export type Board = z.infer<typeof BoardSchema>

export const CalendarDaySchema = z.object({
  date: z.string(),
  counts: z.object({ done: z.number().int(), open: z.number().int(), missed: z.number().int(), held: z.number().int(), skipped: z.number().int() }),
  byCategory: z.record(z.string(), z.number().int()),
  onShift: z.array(z.string()),
  onCall: z.array(z.string()),
  events: z.array(z.object({ id: z.number().int(), title: z.string(), kind: z.string() })),
})
export type CalendarDay = z.infer<typeof CalendarDaySchema>
