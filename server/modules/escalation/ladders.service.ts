import { stepChannels, type Ladder, type LadderInput, type LadderStep } from '#shared/schemas/ladder'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import type { AlertRow } from '../completions/alert-records'
import { getFacility } from '../facility/facility.service'
import { listParameters } from '../parameters/parameters.service'
import { routineLadderId } from '../routines/routine-planning'
import type { TaskRow } from '../tasks/task-queries'
import { LadderEntity } from './escalation.entities'

/** Used when the facility has not chosen ladders yet (common practice: assignee, then on call, then managers). */
export const BUILT_IN_STANDARD: LadderStep[] = [
  { afterMinutes: 0, notify: [{ kind: 'assignee' }], channels: ['email'] },
  { afterMinutes: 30, notify: [{ kind: 'on_call' }], channels: ['email'] },
  { afterMinutes: 60, notify: [{ kind: 'managers' }], channels: ['email'] },
]
// Welfare-critical work and critical readings reach phones from the first step.
export const BUILT_IN_FAST: LadderStep[] = [
  { afterMinutes: 0, notify: [{ kind: 'assignee' }, { kind: 'on_call' }], channels: ['email', 'sms', 'push'] },
  { afterMinutes: 15, notify: [{ kind: 'supervisors' }], channels: ['email', 'sms', 'push'] },
  { afterMinutes: 30, notify: [{ kind: 'managers' }], channels: ['email', 'sms', 'push'] },
]

/** Ladders saved before steps chose channels read as e-mail only. */
const withChannels = <L extends { steps: LadderStep[] }>(ladder: L): L => ({ ...ladder, steps: ladder.steps.map((s) => ({ ...s, channels: stepChannels(s) })) })

const repo = () => db().getRepository(LadderEntity)
export const listLadders = async (): Promise<Ladder[]> => (await repo().find({ order: { id: 'ASC' } })).map(withChannels)

export async function createLadder(input: LadderInput): Promise<Ladder> {
  const saved = await repo().save(input)
  await audit('ladder', saved.id, 'create', null, saved)
  return saved
}

export async function updateLadder(id: number, input: LadderInput): Promise<Ladder> {
  const current = await repo().findOneBy({ id })
  if (!current) throw notFound('That ladder')
  const saved = await repo().save({ ...current, ...input })
  await audit('ladder', id, 'update', current, saved)
  return saved
}

/**
 * Which ladder an alert climbs: the routine's own for a missed task, the parameter's for a
 * critical reading; otherwise the facility's fast ladder for welfare-critical tasks and
 * critical readings, and its standard ladder for the rest (an incident filed by hand has no task
 * and climbs the standard ladder: a late report is not an emergency at the tank).
 */
export async function ladderFor(alert: AlertRow, task: TaskRow | null): Promise<{ name: string; steps: LadderStep[] }> {
  let id = alert.ladderId
  if (!id && alert.kind === 'missed_task' && task?.routineId) id = await routineLadderId(task.routineId)
  if (!id && alert.kind === 'critical_reading') {
    const keys = alert.detail.split(', ').map((part) => part.split(' ')[0])
    const params = await listParameters()
    id = params.find((p) => keys.includes(p.key) && p.ladderId)?.ladderId ?? null
  }
  const fast = alert.kind === 'critical_reading' || task?.priority === 'welfare_critical'
  if (!id) {
    const facility = await getFacility()
    id = fast ? facility.fastLadderId : facility.defaultLadderId
  }
  const ladder = id ? await repo().findOneBy({ id }) : null
  if (ladder) return withChannels(ladder)
  return fast ? { name: 'Fast (built in)', steps: BUILT_IN_FAST } : { name: 'Standard (built in)', steps: BUILT_IN_STANDARD }
}
