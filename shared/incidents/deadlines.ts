import type { Incident } from '../schemas/incident'

export const INCIDENT_DEADLINES = ['welfare', 'committee', 'report'] as const
export type IncidentDeadline = (typeof INCIDENT_DEADLINES)[number]

export const DEADLINE_LABELS: Record<IncidentDeadline, string> = {
  welfare: 'Tell the welfare officer',
  committee: 'Report to the ethics committee',
  report: 'Full report',
}

/** met: done by the deadline; late: done after it; overdue: not done and past it; due: still time; not_needed: the proposal was dismissed. */
export const DEADLINE_STATES = ['met', 'late', 'overdue', 'due', 'not_needed'] as const
export type DeadlineState = (typeof DEADLINE_STATES)[number]

export interface DeadlineStatus {
  key: IncidentDeadline
  label: string
  dueAt: string
  doneAt: string | null
  state: DeadlineState
}

type DeadlineFields = Pick<Incident, 'status' | 'told' | 'welfareDueAt' | 'committeeDueAt' | 'reportDueAt' | 'welfareNotifiedAt' | 'reportedAt' | 'closedAt'>

/**
 * When the welfare officer counts as told: the time recorded for it, else the first person or body
 * the record says was told. The server stores this as `welfareNotifiedAt` when the record is saved,
 * so its escalation and every screen judge the first deadline alike.
 */
export function welfareToldAt(incident: Pick<Incident, 'told' | 'welfareNotifiedAt'>): string | null {
  if (incident.welfareNotifiedAt) return incident.welfareNotifiedAt
  return incident.told.length ? incident.told.map((t) => t.at).sort()[0] : null
}

/** Each of an incident's three deadlines with whether it was met, at `now`. */
export function deadlineStatuses(incident: DeadlineFields, now: Date | string): DeadlineStatus[] {
  const nowMs = new Date(now).getTime()
  const done: Record<IncidentDeadline, string | null> = { welfare: welfareToldAt(incident), committee: incident.reportedAt, report: incident.closedAt }
  const due: Record<IncidentDeadline, string> = { welfare: incident.welfareDueAt, committee: incident.committeeDueAt, report: incident.reportDueAt }
  return INCIDENT_DEADLINES.map((key) => {
    const doneAt = done[key]
    const dueMs = new Date(due[key]).getTime()
    const state: DeadlineState = doneAt
      ? new Date(doneAt).getTime() <= dueMs
        ? 'met'
        : 'late'
      : incident.status === 'dismissed'
        ? 'not_needed'
        : nowMs > dueMs
          ? 'overdue'
          : 'due'
    return { key, label: DEADLINE_LABELS[key], dueAt: due[key], doneAt, state }
  })
}

/** The deadline to show first in a list: the next one overdue, else the next one still due. */
export const nextDeadline = (deadlines: DeadlineStatus[]) => deadlines.find((d) => d.state === 'overdue') ?? deadlines.find((d) => d.state === 'due') ?? null
