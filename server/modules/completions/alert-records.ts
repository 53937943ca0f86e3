import { In, IsNull, LessThanOrEqual } from 'typeorm'
import { db } from '../../db/data-source'
import { AlertEntity, type AlertRow } from './completion.entities'

// Alerts as the escalation and report modules read and answer them; they never touch the entity (record 13b).
export type { AlertRow }

const alerts = () => db().getRepository(AlertEntity)

export const findAlert = (id: number): Promise<AlertRow | null> => alerts().findOneBy({ id })

/** Alerts still climbing their ladder: started by `now`, neither acknowledged nor closed. */
export const openAlertsStartedBy = (now: Date): Promise<AlertRow[]> =>
  alerts().find({ where: { closedAt: IsNull(), acknowledgedAt: IsNull(), startedAt: LessThanOrEqual(now) } })

/** A task's alerts, oldest first. */
export const alertsOfTask = (taskId: number): Promise<AlertRow[]> => alerts().find({ where: { taskId }, order: { startedAt: 'ASC' } })

export const alertsOfTasks = async (taskIds: readonly number[]): Promise<AlertRow[]> => (taskIds.length ? alerts().findBy({ taskId: In([...taskIds]) }) : [])

/** The task was answered (or is gone): the alert stops climbing. */
export async function closeAlert(id: number, at: Date): Promise<void> {
  await alerts().update(id, { closedAt: at })
}

/** Records who answered an alert, once; answers whether this call was the first. */
export async function acknowledgeOpenAlert(id: number, personId: number, at: Date): Promise<boolean> {
  const result = await alerts().update({ id, acknowledgedAt: IsNull() }, { acknowledgedAt: at, acknowledgedById: personId })
  return !!result.affected
}

/** Alerts nobody has acknowledged or closed yet, latest first (the on-call summary). */
export const openUnacknowledgedAlerts = (limit: number): Promise<AlertRow[]> =>
  alerts().find({ where: { closedAt: IsNull(), acknowledgedAt: IsNull() }, order: { startedAt: 'DESC' }, take: limit })
