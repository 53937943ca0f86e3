import { DateTime } from 'luxon'
import { IsNull, Not } from 'typeorm'
import type { Reading } from '#shared/schemas/completion'
import { db } from '../../db/data-source'
import { logger } from '../../lib/logger'
import { getFacility } from '../facility/facility.service'
import { createTask, type TaskRow } from '../tasks/task-writes.service'
import { AlertEntity } from './completion.entities'

export const RECHECK_AFTER_MINUTES = 30

/** A flagged completion asks for the same check again soon, by the same person. */
export async function createRecheck(task: TaskRow, personId: number): Promise<TaskRow> {
  const due = new Date(Date.now() + RECHECK_AFTER_MINUTES * 60_000)
  const zone = (await getFacility()).timeZone
  const localStart = DateTime.fromJSDate(due).setZone(zone).toFormat("yyyy-MM-dd'T'HH:mm:ss")
  return createTask({
    routineId: null,
    eventId: task.eventId,
    title: `Recheck: ${task.title.replace(/^Recheck: /, '')}`,
    category: task.category,
    instructions: `Flagged at the last check. Read again and compare. ${task.instructions}`.trim(),
    priority: task.flag === 'critical' ? 'welfare_critical' : task.priority,
    targetKind: task.targetKind,
    targetId: task.targetId,
    tankId: task.tankId,
    areaId: task.areaId,
    localDate: localStart.slice(0, 10),
    localStart,
    occurrenceStart: localStart,
    dueAt: due,
    windowStartAt: new Date(),
    graceUntil: new Date(due.getTime() + 30 * 60_000),
    durationMinutes: task.durationMinutes,
    status: 'open',
    assigneeId: personId,
    assignedManually: true,
    requiredReadings: task.requiredReadings,
    recheckOfTaskId: task.id,
    version: 1,
  })
}

/**
 * A critical reading starts the escalation at once; the ladder sends the mail. One alert per task:
 * a repeat (a retry, a second amendment) changes nothing, and one closed because an amendment
 * cleared the reading starts again when a later amendment makes it critical once more.
 */
export async function startCriticalAlert(task: Pick<TaskRow, 'id'>, critical: Array<Pick<Reading, 'parameterKey' | 'value' | 'unit'>>) {
  await raiseCriticalAlert(task.id, critical.map((r) => `${r.parameterKey} ${r.value} ${r.unit}`).join(', '))
}

/** The same for a critical state described in words (an oxygen cylinder near its reserve). */
export async function raiseCriticalAlert(taskId: number, text: string) {
  const detail = text.slice(0, 500)
  const alerts = db().getRepository(AlertEntity)
  const now = new Date()
  await alerts
    .createQueryBuilder()
    .insert()
    .values({ taskId, incidentId: null, kind: 'critical_reading', detail, ladderId: null, startedAt: now })
    .orIgnore()
    .execute()
  await alerts.update(
    { taskId, kind: 'critical_reading', closedAt: Not(IsNull()) },
    { detail, startedAt: now, closedAt: null, acknowledgedAt: null, acknowledgedById: null },
  )
  logger.warn({ taskId, detail }, 'critical reading: escalation started')
}

/** The reading is no longer critical (an amendment corrected it): its alert stops climbing the ladder. */
export async function closeCriticalAlert(taskId: number, at: Date) {
  await db().getRepository(AlertEntity).update({ taskId, kind: 'critical_reading', closedAt: IsNull() }, { closedAt: at })
}

export type IncidentAlertKind = 'incident_overdue' | 'incident_welfare_overdue' | 'incident_report_overdue'

/**
 * An incident past one of its deadlines starts one alert per deadline. It climbs the ladder of the
 * task the incident came from; an incident filed by hand has no task, and its alert belongs to the
 * incident alone (escalation then uses the facility's standard ladder, record 14e).
 */
export async function startIncidentAlert(
  incident: { id: number; taskId: number | null },
  detail: string,
  at: Date,
  kind: IncidentAlertKind = 'incident_overdue',
) {
  await db()
    .getRepository(AlertEntity)
    .createQueryBuilder()
    .insert()
    .values({ taskId: incident.taskId, incidentId: incident.id, kind, detail: detail.slice(0, 500), ladderId: null, startedAt: at })
    .orIgnore()
    .execute()
  logger.warn({ incidentId: incident.id, taskId: incident.taskId, kind, detail }, 'incident overdue: escalation started')
}

/** The deadline was met after all: its alert stops climbing. */
export async function closeIncidentAlert(incidentId: number, kind: IncidentAlertKind, at: Date) {
  await db().getRepository(AlertEntity).update({ incidentId, kind, closedAt: IsNull() }, { closedAt: at })
}
