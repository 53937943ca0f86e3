import type { Incident } from '../schemas/incident'

export const DEADLINE_KEYS = ['welfare', 'committee', 'report'] as const
export type DeadlineKey = (typeof DEADLINE_KEYS)[number]
/** met / late once done; running / overdue while not; void when the proposal was dismissed. */
export type DeadlineState = 'met' | 'late' | 'running' | 'overdue' | 'void'

export const DEADLINE_LABELS: Record<DeadlineKey, string> = {
  welfare: 'Tell the welfare officer',
  committee: 'Report to the ethics committee',
  report: 'Full report',
}

export interface DeadlineStatus {
  key: DeadlineKey
  dueAt: string
  /** When it was done: the first person told, the report to the committee, the closing of the record. */
  doneAt: string | null
  state: DeadlineState
}

type DeadlineFields = Pick<Incident, 'status' | 'told' | 'welfareDueAt' | 'committeeDueAt' | 'reportDueAt' | 'reportedAt' | 'closedAt'>

const firstTold = (told: Incident['told']) => (told.length ? told.map((t) => t.at).sort()[0] : null)

/** Where each of an incident's three deadlines stands at `now`. */
export function incidentDeadlines(incident: DeadlineFields, now: Date): DeadlineStatus[] {
  const done: Record<DeadlineKey, string | null> = { welfare: firstTold(incident.told), committee: incident.reportedAt, report: incident.closedAt }
  const due: Record<DeadlineKey, string> = { welfare: incident.welfareDueAt, committee: incident.committeeDueAt, report: incident.reportDueAt }
  return DEADLINE_KEYS.map((key) => {
    const doneAt = done[key]
    const dueMs = new Date(due[key]).getTime()
    let state: DeadlineState
    if (incident.status === 'dismissed') state = 'void'
    else if (doneAt) state = new Date(doneAt).getTime() <= dueMs ? 'met' : 'late'
    else state = now.getTime() <= dueMs ? 'running' : 'overdue'
    return { key, dueAt: due[key], doneAt, state }
  })
}

/** The deadline to show first in a list: the next one still running or overdue. */
export const nextDeadline = (deadlines: DeadlineStatus[]) => deadlines.find((d) => d.state === 'overdue') ?? deadlines.find((d) => d.state === 'running') ?? null
