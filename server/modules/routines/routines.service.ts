import { plannableRuleProblem } from '#shared/schedule/plannable-rule'
import type { Routine, RoutineData, ParsedUpdateRoutineInput } from '#shared/schemas/routine'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { conflict, notFound, validationError } from '../../lib/errors'
import { getFacility } from '../facility/facility.service'
import { listParameters } from '../parameters/parameters.service'
import { removeUntouchedFutureTasks } from '../tasks/planned-task-writes'
import { routineNeedsPlanning } from './routine-changes'
import { RoutineEntity, type RoutineRow } from './routine.entity'

const repo = () => db().getRepository(RoutineEntity)

function toRoutine(row: RoutineRow): Routine {
  const { createdAt: _c, updatedAt: _u, ...routine } = row
  void _c
  void _u
  return routine
}

export async function listRoutines(): Promise<Routine[]> {
  return (await repo().find({ order: { category: 'ASC', name: 'ASC' } })).map(toRoutine)
}

export async function getRoutine(id: number): Promise<Routine> {
  const row = await repo().findOneBy({ id })
  if (!row) throw notFound('That routine')
  return toRoutine(row)
}

/** Checks what the schema cannot: tasks can be planned from the rule, the readings exist. */
async function checkRoutine(data: RoutineData) {
  const ruleError = plannableRuleProblem({ rrule: data.rrule, dtstart: data.dtstart, tzid: (await getFacility()).timeZone })
  if (ruleError) throw validationError(ruleError, { rrule: [ruleError] })
  const known = new Set((await listParameters()).map((p) => p.key))
  const unknown = data.requiredReadings.filter((k) => !known.has(k))
  if (unknown.length) throw validationError(`Unknown reading: ${unknown.join(', ')}`, { requiredReadings: [`Unknown: ${unknown.join(', ')}`] })
}

export async function createRoutine(data: RoutineData): Promise<Routine> {
  await checkRoutine(data)
  const saved = await repo().save(repo().create({ ...data, version: 1 }))
  await audit('routine', saved.id, 'create', null, toRoutine(saved))
  if (!saved.paused) await routineNeedsPlanning.announce({ routineId: saved.id })
  return toRoutine(saved)
}

export async function updateRoutine(id: number, { version, ...data }: ParsedUpdateRoutineInput): Promise<Routine> {
  const current = await repo().findOneBy({ id })
  if (!current) throw notFound('That routine')
  if (current.version !== version) {
    throw conflict('Someone changed this routine after you opened it. Reload to see their changes.', { currentVersion: current.version })
  }
  await checkRoutine(data)
  const saved = await repo().save({ ...current, ...data, version: current.version + 1 })
  await audit('routine', id, 'update', toRoutine(current), toRoutine(saved))
  // Its untouched future tasks follow the old rule: they go, and an active routine is planned afresh.
  await removeUntouchedFutureTasks({ routineId: id })
  if (!saved.paused) await routineNeedsPlanning.announce({ routineId: id })
  return toRoutine(saved)
}

export async function deleteRoutine(id: number): Promise<void> {
  await audit('routine', id, 'delete', await getRoutine(id), null)
  await removeUntouchedFutureTasks({ routineId: id })
  // Past and kept tasks stay as records; the database clears their routine id (ON DELETE SET NULL,
  // record 13f) and the audit row above keeps what the routine was.
  await repo().delete(id)
}
