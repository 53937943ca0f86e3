import type { Incident } from '../schemas/incident'

export const INCIDENT_DEADLINES = ['welfare', 'committee', 'report'] as const
export type IncidentDeadline = (typeof INCIDENT_DEADLINES)[number]

export const DEADLINE_LABELS: Record<IncidentDeadline, string> = {
  welfare: 'Welfare officer told',
  committee: 'Ethics committee told',
  report: 'Full report filed',
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

type DeadlineFields = Pick<Incident, 'status' | 'welfareDueAt' | 'committeeDueAt' | 'reportDueAt' | 'welfareNotifiedAt' | 'reportedAt' | 'closedAt'>

/** Which date meets which deadline: the welfare officer told, the committee told (reported), the full report filed (closed). */
const DONE_BY: Record<IncidentDeadline, { due: keyof DeadlineFields; done: keyof DeadlineFields }> = {
  welfare: { due: 'welfareDueAt', done: 'welfareNotifiedAt' },
  committee: { due: 'committeeDueAt', done: 'reportedAt' },
  report: { due: 'reportDueAt', done: 'closedAt' },
}

/** Each of an incident's three deadlines with whether it was met, at `now`. ISO instants compare as strings. */
export function deadlineStatuses(incident: DeadlineFields, now: string): DeadlineStatus[] {
  return INCIDENT_DEADLINES.map((key) => {
    const dueAt = incident[DONE_BY[key].due] as string
    const doneAt = (incident[DONE_BY[key].done] as string | null) ?? null
    const state: DeadlineState = doneAt ? (doneAt <= dueAt ? 'met' : 'late') : incident.status === 'dismissed' ? 'not_needed' : now > dueAt ? 'overdue' : 'due'
    return { key, label: DEADLINE_LABELS[key], dueAt, doneAt, state }
  })
}
