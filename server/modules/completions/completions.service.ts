import { worstBand } from '#shared/readings/band'
import { judgeReadings, type ReadingJudgement } from '#shared/readings/judge-readings'
import type { CompletionResult, ParsedCompletionInput } from '#shared/schemas/completion'
import { MORTALITY_READING } from '#shared/schemas/stock'
import type { Person } from '#shared/schemas/person'
import { IsNull } from 'typeorm'
import { db, inTransaction } from '../../db/data-source'
import { duplicateKeyName } from '../../db/database-errors'
import { insertRows } from '../../db/prepared'
import { conflict, forbidden, validationError } from '../../lib/errors'
import { audit } from '../audit/audit.service'
import { getPersonRow } from '../people/people.service'
import { toPerson } from '../people/person.mapper'
import { personNames } from '../people/person-reads'
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
 *
 * Round trips are the cost (record 16e): the task is read once, the place's rules come from the
 * process's copies, the answer is built from the rows in hand, and everything the completion
 * writes (the claim, its record and readings, recheck, alert, proposals, audit row, outbox rows
 * and the stored answer) joins the request's one transaction.
 */
export async function completeTask(taskId: number, person: Person, data: ParsedCompletionInput): Promise<CompletionResult> {
  const task = await getTaskRow(taskId)
  if (isFinished(task)) {
    // A retry of a committed completion finds its task finished and gets the first answer.
    const replay = await replayOf(data.completionId, taskId)
    if (replay) return replay
    // A finished task answers 409 with who finished it, before any question of whose it was.
    if (person.role !== 'observer') await assertStillOpen(task)
  }
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

  const result = await inTransaction(async () => {
    const closing = {
      outcome: data.outcome,
      flag: flag === 'ok' ? null : flag,
      lateMinutes,
      completedAt: doneAt,
      completedById: performer.id,
      assigneeId: task.assigneeId ?? performer.id,
    }
    if (!(await closeTask(task, closing))) return null
    // The claim matched the version read above, so the row now is that one with the closing applied.
    const { outcome, ...closed } = closing
    const updated: TaskRow = { ...task, ...closed, status: outcome, version: task.version + 1 }
    // A paper sheet typed in later asks for no recheck: the moment has passed; the flag stays on record.
    const recheckTaskId = flag === 'ok' || performer.id !== person.id ? null : (await createRecheck(updated, person.id)).id
    const response: CompletionResult = {
      task: toTask(updated, await loadTaskContext([updated])),
      readings: judged.readings,
      recheckTaskId,
      notes: judged.notes,
    }
    await insertCompletion({
      id: data.completionId,
      taskId: task.id,
      personId: performer.id,
      enteredById: performer.id === person.id ? null : person.id,
      outcome: data.outcome,
      skipReason: data.skipReason ?? null,
      note: data.note ?? null,
      doneAt,
      lateMinutes,
      response,
    })
    if (judged.readings.length) {
      await insertRows(
        ReadingEntity,
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
    if (mortality?.plan) await writeRoundMortality(db(), mortality.plan, { completionId: data.completionId, personId: performer.id, at: doneAt })
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
    await audit('completion', data.completionId, 'create', null, { taskId: task.id, outcome: data.outcome, flag, performedById: performer.id, recheckTaskId })
    return response
  })
  if (!result) {
    // Lost the race: to this very completion sent twice at once (its answer), or to someone else (who).
    const now = await getTaskRow(taskId)
    const replay = isFinished(now) ? await replayOf(data.completionId, taskId) : null
    if (replay) return replay
    await assertStillOpen(now)
    throw conflict('This task changed while you were completing it. Check it and try again.')
  }
  return result
}

const isFinished = (task: Pick<TaskRow, 'status'>) => task.status === 'done' || task.status === 'skipped'

/** The answer already given for this completion id, or null when it was never stored. */
async function replayOf(completionId: string, taskId: number): Promise<CompletionResult | null> {
  const replay = await db().getRepository(CompletionEntity).findOneBy({ id: completionId })
  if (!replay) return null
  if (replay.taskId !== taskId) throw conflict(USED_ELSEWHERE)
  // Completions stored before the answer joined their commit may have none: answer from the record.
  return (replay.response as CompletionResult | null) ?? answerFromRecord(replay)
}

const USED_ELSEWHERE = 'That completion id was already used for another task.'

/** The completion with its answer stored for a replay; its id taken already means it was sent for another task. */
async function insertCompletion(row: Omit<CompletionRow, 'createdAt'>) {
  try {
    await insertRows(CompletionEntity, [{ ...row, response: row.response as never }])
  } catch (err) {
    if (duplicateKeyName(err) === 'PRIMARY') throw conflict(USED_ELSEWHERE)
    throw err
  }
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
    task: toTask(task, await loadTaskContext([task])),
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
  if (!isFinished(task)) return
  const names = await personNames([task.completedById])
  const who = (task.completedById && names.get(task.completedById)) || 'someone'
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
