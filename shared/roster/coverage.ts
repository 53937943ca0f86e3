import type { CoverageWarning } from '../schemas/roster'

export interface CoverageInput {
  dates: string[]
  shifts: Array<{ id: number; personId: number; personName: string; date: string; start: string; end: string }>
  /** Duties as [start, end) in epoch ms, with who holds them. */
  duties: Array<{ personId: number; startsAt: number; endsAt: number }>
  /** A facility day as [midnight, next midnight) in epoch ms (days can be 23 or 25 hours long). */
  dayRange: (date: string) => readonly [number, number]
  tasks: Array<{ id: number; date: string; time: string; title: string; priority: string; assigneeId: number | null; assigneeName: string | null }>
}

const minutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5))
/** A shift as minutes from its day's midnight; one ending at or before its start runs past midnight. */
const span = (s: { start: string; end: string }) => [minutes(s.start), minutes(s.end) <= minutes(s.start) ? minutes(s.end) + 1440 : minutes(s.end)] as const

/**
 * The roster's gaps a supervisor must see: a day with tasks and nobody on shift, a time with
 * nobody on call, a person rostered twice at once, and a welfare-critical task assigned to
 * someone who is not on shift at its time.
 */
export function coverageWarnings(input: CoverageInput): CoverageWarning[] {
  const warnings: CoverageWarning[] = []
  for (const date of input.dates) {
    const shifts = input.shifts.filter((s) => s.date === date)
    const tasks = input.tasks.filter((t) => t.date === date)
    if (tasks.length && !shifts.length) {
      warnings.push({ kind: 'tasks_without_shift', date, message: `${tasks.length} tasks on ${date} and nobody on shift`, personId: null, taskId: null })
    }
    const byPerson = new Map<number, typeof shifts>()
    for (const s of shifts) byPerson.set(s.personId, [...(byPerson.get(s.personId) ?? []), s])
    for (const [personId, own] of byPerson) {
      for (let i = 0; i < own.length; i++) {
        for (let j = i + 1; j < own.length; j++) {
          const [a0, a1] = span(own[i])
          const [b0, b1] = span(own[j])
          if (a0 < b1 && b0 < a1) {
            warnings.push({
              kind: 'double_booked',
              date,
              message: `${own[i].personName} is rostered twice at once on ${date} (${own[i].start}–${own[i].end} and ${own[j].start}–${own[j].end})`,
              personId,
              taskId: null,
            })
          }
        }
      }
    }
    for (const task of tasks) {
      if (task.priority !== 'welfare_critical' || task.assigneeId === null) continue
      const at = minutes(task.time)
      const covered = shifts.some((s) => s.personId === task.assigneeId && span(s)[0] <= at && at < span(s)[1])
      if (!covered) {
        warnings.push({
          kind: 'welfare_task_off_shift',
          date,
          message: `${task.title} at ${task.time} is assigned to ${task.assigneeName ?? 'someone'}, who is not on shift then`,
          personId: task.assigneeId,
          taskId: task.id,
        })
      }
    }
    const [dayStart, dayEnd] = input.dayRange(date)
    const gaps = uncovered(dayStart, dayEnd, input.duties)
    if (gaps > 0)
      warnings.push({ kind: 'no_one_on_call', date, message: `Nobody is on call for ${formatMinutes(gaps)} on ${date}`, personId: null, taskId: null })
  }
  return warnings
}

function uncovered(start: number, end: number, duties: CoverageInput['duties']): number {
  const parts = duties
    .filter((d) => d.startsAt < end && d.endsAt > start)
    .map((d) => [Math.max(d.startsAt, start), Math.min(d.endsAt, end)] as const)
    .sort((a, b) => a[0] - b[0])
  let cursor = start
  let gap = 0
  for (const [s, e] of parts) {
    if (s > cursor) gap += s - cursor
    cursor = Math.max(cursor, e)
  }
  if (cursor < end) gap += end - cursor
  return Math.round(gap / 60_000)
}

const formatMinutes = (m: number) => (m >= 60 ? `${Math.floor(m / 60)} h${m % 60 ? ` ${m % 60} min` : ''}` : `${m} min`)
