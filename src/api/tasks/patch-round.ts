import type { ReadingSpec, Round, RoundTask } from '#shared/schemas/round'
import type { Task } from '#shared/schemas/task'

/** The server's walking order: area order (quarantine last), then target, then time due. */
export function sortRoundTasks(round: Round, tasks: RoundTask[]): RoundTask[] {
  const rank = new Map(round.areas.map((a, i) => [a.id, i]))
  return [...tasks].sort(
    (a, b) =>
      (rank.get(a.areaId ?? -1) ?? 99) - (rank.get(b.areaId ?? -1) ?? 99) || a.targetLabel.localeCompare(b.targetLabel) || a.dueAt.localeCompare(b.dueAt),
  )
}

const sameTarget = (a: Task, b: Task) => a.targetKind === b.targetKind && a.targetId === b.targetId

/**
 * A task from an event or a completion carries no reading specs; the same readings at the
 * same target have the same limits, so they are borrowed from the task it rechecks or a
 * sibling on that target. Null when the round does not know them (then refetch).
 */
type RoundExtras = Pick<RoundTask, 'readingSpecs' | 'salinitySetpoint' | 'rationG'>

function specsFor(round: Round, task: Task): RoundExtras | null {
  const original = round.tasks.find((t) => t.id === task.recheckOfTaskId)
  const pool = original ? [original] : round.tasks.filter((t) => sameTarget(t, task))
  const known = new Map<string, ReadingSpec>()
  for (const t of pool) for (const s of t.readingSpecs) known.set(s.key, s)
  const readingSpecs = task.requiredReadings.map((key) => known.get(key))
  if (readingSpecs.some((s) => !s)) return null
  // A ration is worked out per task on the server; a task placed from an event shows none until the next fetch.
  return { readingSpecs: readingSpecs as ReadingSpec[], salinitySetpoint: pool[0]?.salinitySetpoint ?? null, rationG: null }
}

const sameKeys = (a: string[], b: string[]) => a.length === b.length && a.every((k, i) => k === b[i])

/**
 * Applies one changed task to a round the way the server would build it: the person's own
 * and unassigned tasks of that day. Returns 'refetch' when the task cannot be placed from
 * what the round already knows.
 */
export function patchRound(round: Round, task: Task, personId: number | null): Round | 'refetch' {
  const existing = round.tasks.find((t) => t.id === task.id)
  const others = round.tasks.filter((t) => t.id !== task.id)
  const belongs = task.localDate === round.date && (task.assigneeId === null || task.assigneeId === personId)
  if (!belongs) return existing ? { ...round, tasks: others } : round
  // Events can overtake each other; never step back to an older version.
  if (existing && existing.version > task.version) return round
  const specs: RoundExtras | null =
    existing && sameKeys(existing.requiredReadings, task.requiredReadings)
      ? { readingSpecs: existing.readingSpecs, salinitySetpoint: existing.salinitySetpoint, rationG: existing.rationG }
      : specsFor(round, task)
  if (!specs) return 'refetch'
  return { ...round, tasks: sortRoundTasks(round, [...others, { ...task, ...specs }]) }
}
