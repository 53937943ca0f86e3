import { complianceRows } from '#shared/reports/compliance'
import type { ComplianceRow, ResponseRow, WelfareRow } from '#shared/schemas/report'
import { alertsOfTasks } from '../completions/alert-records'
import { readingsOfTasks } from '../completions/reading-lookups'
import { flaggedOrMissedBetween, rechecksOf, tasksBetween, welfareChecksBetween, type TaskRow } from '../tasks/task-queries'
import { loadTaskContext } from '../tasks/tasks.service'
import { targetLabel } from '../tasks/targets'

export type GroupBy = 'category' | 'area' | 'person'

export async function complianceReport(from: string, to: string, by: GroupBy, period: 'day' | 'week'): Promise<ComplianceRow[]> {
  const rows = await tasksBetween(from, to)
  const ctx = await loadTaskContext()
  const groupOf = (t: TaskRow) =>
    by === 'category'
      ? t.category
      : by === 'area'
        ? (ctx.cat.areas.get(t.areaId ?? -1)?.name ?? 'No area')
        : (ctx.names.get(t.completedById ?? t.assigneeId ?? -1) ?? 'Unassigned')
  return complianceRows(
    rows.map((t) => ({ localDate: t.localDate, status: t.status, lateMinutes: t.lateMinutes, group: groupOf(t) })),
    period,
  )
}

/** How fast flags and escalations were answered: alert to acknowledgement, flag to recheck done. */
export async function responseReport(from: string, to: string): Promise<ResponseRow[]> {
  const tasks = await flaggedOrMissedBetween(from, to)
  if (!tasks.length) return []
  const ids = tasks.map((t) => t.id)
  const [alerts, rechecks, ctx] = await Promise.all([alertsOfTasks(ids), rechecksOf(ids), loadTaskContext()])
  const minutesBetween = (a: Date | null | undefined, b: Date | null | undefined) => (a && b ? Math.round((b.getTime() - a.getTime()) / 60_000) : null)
  return tasks.map((t) => {
    const alert = alerts.find((a) => a.taskId === t.id)
    const recheck = rechecks.find((r) => r.recheckOfTaskId === t.id)
    return {
      date: t.localDate,
      time: t.localStart.slice(11, 16),
      task: t.title,
      where: targetLabel(t.targetKind, t.targetId, ctx.cat),
      flag: t.flag ?? (t.status === 'missed' ? 'missed' : ''),
      alert: alert?.kind ?? '',
      alertStartedAt: alert?.startedAt.toISOString() ?? '',
      acknowledgedBy: alert?.acknowledgedById ? (ctx.names.get(alert.acknowledgedById) ?? '') : '',
      minutesToAcknowledge: minutesBetween(alert?.startedAt, alert?.acknowledgedAt),
      recheckStatus: recheck?.status ?? '',
      minutesToRecheck: minutesBetween(t.completedAt, recheck?.completedAt),
    }
  })
}

/** The welfare-check record for a date range and tanks: each check with its readings, who and when. */
export async function welfareReport(from: string, to: string, tankIds: number[]): Promise<WelfareRow[]> {
  const tasks = await welfareChecksBetween(from, to, tankIds)
  const ctx = await loadTaskContext()
  const readings = await readingsOfTasks(tasks.map((t) => t.id))
  return tasks.map((t) => {
    const own = readings.filter((r) => r.taskId === t.id && !r.supersededAt)
    return {
      date: t.localDate,
      due: t.localStart.slice(11, 16),
      task: t.title,
      tank: targetLabel(t.targetKind, t.targetId, ctx.cat),
      status: t.status,
      doneAt: t.completedAt?.toISOString() ?? '',
      doneBy: t.completedById ? (ctx.names.get(t.completedById) ?? '') : '',
      lateMinutes: t.lateMinutes ?? '',
      readings: own.map((r) => `${r.parameterKey}=${r.value} ${r.unit} (${r.band})${r.amendmentId ? ' amended' : ''}`).join('; '),
      flag: t.flag ?? '',
    }
  })
}
