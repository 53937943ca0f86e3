import { worstBand } from '#shared/readings/band'
import { judgeReadings, type ReadingJudgement } from '#shared/readings/judge-readings'
import type { CompletionResult, ParsedCompletionInput } from '#shared/schemas/completion'
import { MORTALITY_READING } from '#shared/schemas/stock'
import type { Person } from '#shared/schemas/person'
import { IsNull } from 'typeorm'
import { db } from '../../db/data-source'
import { conflict, forbidden, validationError } from '../../lib/errors'
import { audit } from '../audit/audit.service'
import { getPersonRow } from '../people/people.service'
import { toPerson } from '../people/person.mapper'
import { assessRoundMortality, writeRoundMortality } from '../stock/round-mortality'
import { closeTask, recheckOf, type TaskRow } from '../tasks/task-writes.service'
import { getTaskRow, loadTaskContext } from '../tasks/tasks.service'
import { toTask } from '../tasks/task.mapper'
import { CompletionEntity, ReadingEntity, type CompletionRow } from './completion.entities'
import { completionJudged } from './completion-judged'
import { createRecheck, startCriticalAlert } from './follow-ups'
import { readingContextFor, type ReadingContext } from './reading-context'
import { assertMayComplete } from './who-may-complete'

/**
 * The server's judgement of a completion: every required reading present and physically
 * possible, derived values worked out, each reading banded against the limits for that place,
 * a flag and a recheck when anything is out of the ok range, and exactly one winner when two
 * people complete the same task.
 */
export async function completeTask(taskId: number, person: Person, data: ParsedCompletionInput): Promise<CompletionResult> {
  const replay = await db().getRepository(CompletionEntity).findOneBy({ id: data.completionId })
  if (replay) {
    if (replay.taskId !== taskId) throw conflict('That completion id was already used for another task.')
    // A retry of a committed completion gets the stored answer; completions stored before the
    // answer joined their commit may have none: answer from the record instead.
    return (replay.response as CompletionResult | null) ?? answerFromRecord(replay)
  }
  const task = await getTaskRow(taskId)
  // A finished task answers 409 with who finished it, before any question of whose it was.
  if (person.role !== 'observer') await assertStillOpen(task)
  assertMayComplete(task, person)
  if (data.version !== undefined && data.version !== task.version) {
    throw conflict('This task changed since you opened it (it may have been moved or reassigned). Check it and try again.', { currentVersion: task.version })
  }

  const context = await readingContextFor(task)
  const doneAt = data.doneAt ? new Date(data.doneAt) : new Date()
  const performer = await performerFor(person, data.performedById)
  if (doneAt.getTime() > Date.now() + 60_000) throw validationError('A task cannot be completed in the future.', { doneAt: ['In the future'] })
  const judged: ReadingJudgement = data.outcome === 'done' ? judgeTyped(task, data.readings, context) : { readings: [], flag: 'ok', notes: [], problems: {} }
  const mortality = data.outcome === 'done' ? await assessRoundMortality(context.tankId, data.readings[MORTALITY_READING], data.mortality, doneAt) : null
  judged.notes.push(...(mortality?.notes ?? []))
  const flag = data.outcome === 'done' ? worstBand([judged.flag, mortality?.band ?? 'ok']) : 'ok'
  const lateMinutes = doneAt > task.dueAt ? Math.floor((doneAt.getTime() - task.dueAt.getTime()) / 60_000) : null

  const result = await db().transaction(async (manager) => {
    const closing = {
      outcome: data.outcome,
      flag: flag === 'ok' ? null : flag,
      lateMinutes,
      completedAt: doneAt,
      completedById: performer.id,
      assigneeId: task.assigneeId ?? performer.id,
    }
    if (!(await closeTask(task, closing))) return null
    await manager.getRepository(CompletionEntity).insert({
      id: data.completionId,
      taskId: task.id,
      personId: performer.id,
      enteredById: performer.id === person.id ? null : person.id,
      outcome: data.outcome,
      skipReason: data.skipReason ?? null,
      note: data.note ?? null,
      doneAt,
      lateMinutes,
      response: null as never,
    })
    if (judged.readings.length) {
      await manager.getRepository(ReadingEntity).insert(
        judged.readings.map((r) => ({
          completionId: data.completionId,
          taskId: task.id,
          tankId: context.tankId,
          systemId: context.systemId,
          parameterKey: r.parameterKey,
          value: r.value,
          unit: r.unit,
          band: r.band,
          derived: r.derived,
          takenAt: doneAt,
          personId: performer.id,
        })),
      )
    }
    if (mortality?.plan) await writeRoundMortality(manager, mortality.plan, { completionId: data.completionId, personId: performer.id, at: doneAt })

    // The recheck, the alert, the stored answer and the outbox rows commit with the completion:
    // a crash can lose all of it (the retry then does it all) but never half.
    const updated = await getTaskRow(taskId)
    // A paper sheet typed in later asks for no recheck: the moment has passed; the flag stays on record.
    const recheckTaskId = flag === 'ok' || performer.id !== person.id ? null : (await createRecheck(updated, person.id)).id
    if (flag === 'critical')
      await startCriticalAlert(
        updated,
        judged.readings.filter((r) => r.band === 'critical'),
      )
    await completionJudged.announce({
      task: updated,
      flag,
      readings: judged.readings,
      mortality: mortality?.plan,
      completionId: data.completionId,
      now: new Date(),
    })
    const response: CompletionResult = { task: toTask(updated, await loadTaskContext()), readings: judged.readings, recheckTaskId, notes: judged.notes }
    await manager.getRepository(CompletionEntity).update(data.completionId, { response: response as never })
    await audit('completion', data.completionId, 'create', null, { taskId: task.id, outcome: data.outcome, flag, performedById: performer.id, recheckTaskId })
    return response
  })
  if (!result) {
    // Lost the race: say who won.
    await assertStillOpen(await getTaskRow(taskId))
    throw conflict('This task changed while you were completing it. Check it and try again.')
  }
  return result
}

async function answerFromRecord(row: CompletionRow): Promise<CompletionResult> {
  const [task, readings, recheck] = await Promise.all([
    getTaskRow(row.taskId),
    db()
      .getRepository(ReadingEntity)
      .find({ where: { completionId: row.id, amendmentId: IsNull() }, order: { id: 'ASC' } }),
    recheckOf(row.taskId),
  ])
  return {
    task: toTask(task, await loadTaskContext()),
    readings: readings.map(({ parameterKey, value, unit, band, derived }) => ({ parameterKey, value, unit, band, derived })),
    recheckTaskId: recheck?.id ?? null,
    notes: [],
  }
}

async function performerFor(person: Person, performedById: number | undefined): Promise<Person> {
  if (performedById === undefined || performedById === person.id) return person
  if (person.role !== 'manager' && person.role !== 'supervisor') throw forbidden('Only supervisors and managers can enter work done by someone else.')
  const row = await getPersonRow(performedById).catch(() => null)
  if (!row) throw validationError('That person does not exist.', { performedById: ['Choose who did the work'] })
  return toPerson(row)
}

async function assertStillOpen(task: TaskRow) {
  if (task.status !== 'done' && task.status !== 'skipped') return
  const ctx = await loadTaskContext()
  const who = (task.completedById && ctx.names.get(task.completedById)) || 'someone'
  const when = task.completedAt?.toISOString() ?? 'earlier'
  throw conflict(`${who} already ${task.status === 'done' ? 'completed' : 'skipped'} this task at ${when}.`, {
    completedByName: who,
    completedAt: task.completedAt?.toISOString() ?? null,
  })
}

/** The shared judgement; anything it finds wrong refuses the whole completion. */
function judgeTyped(task: TaskRow, values: Record<string, number>, context: ReadingContext) {
  const judgement = judgeReadings(values, context.ruleFor, { required: task.requiredReadings, salinitySetpoint: context.salinitySetpoint })
  const problems = Object.entries(judgement.problems)
  if (problems.length) {
    const fieldErrors = Object.fromEntries(problems.map(([key, p]) => [`readings.${key}`, [p.message]]))
    throw validationError(`Nothing was saved: ${problems[0][1].message}.`, fieldErrors)
  }
  return judgement
}
