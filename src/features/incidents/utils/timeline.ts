import { DEADLINE_LABELS, type DeadlineStatus } from '#shared/incidents/deadlines'
import type { Incident } from '#shared/schemas/incident'

export type TimelineKind = 'started' | 'proposed' | 'confirmed' | 'dismissed' | 'told' | 'note' | 'reported' | 'closed' | 'escalated' | 'deadline'

export interface TimelineEntry {
  at: string
  kind: TimelineKind
  title: string
  text?: string
  deadline?: DeadlineStatus
}

const SOURCE: Record<Incident['source'], string> = {
  missed_task: 'Proposed by Roundtide: a welfare-critical check was missed',
  critical_recheck: 'Proposed by Roundtide: a critical reading was confirmed by its recheck',
  mortality_threshold: 'Proposed by Roundtide: deaths passed the facility’s threshold',
  manual: 'Recorded by hand',
}

/** Everything that happened to the incident, and its three deadlines, in time order. */
export function incidentTimeline(i: Incident, deadlines: DeadlineStatus[]): TimelineEntry[] {
  const by = i.decidedByName ? ` by ${i.decidedByName}` : ''
  const filed = i.source === 'manual' && i.filedByName ? `Filed by hand by ${i.filedByName}` : SOURCE[i.source]
  // A supervisor or manager who files an incident confirms it by filing; only a technician's waits for a decision.
  const decidedApart = i.decidedAt && !(i.source === 'manual' && i.decidedById === i.filedById)
  const entries: Array<TimelineEntry | null> = [
    { at: i.startedAt, kind: 'started', title: 'Started' },
    { at: i.noticedAt, kind: 'proposed', title: filed, text: i.whatHappened },
    decidedApart && i.decidedAt
      ? {
          at: i.decidedAt,
          kind: i.status === 'dismissed' ? 'dismissed' : 'confirmed',
          title: `${i.status === 'dismissed' ? 'Dismissed' : 'Confirmed'}${by}`,
          text: i.decisionReason ?? undefined,
        }
      : null,
    ...i.told.map((t): TimelineEntry => ({ at: t.at, kind: 'told', title: `Told ${t.who}` })),
    ...i.notes.map((n): TimelineEntry => ({ at: n.at, kind: 'note', title: `Note by ${n.personName}`, text: n.text })),
    i.reportedAt ? { at: i.reportedAt, kind: 'reported', title: 'Reported to the ethics committee' } : null,
    i.closedAt ? { at: i.closedAt, kind: 'closed', title: 'Closed with the full report' } : null,
    i.escalatedAt ? { at: i.escalatedAt, kind: 'escalated', title: 'Escalated: the committee deadline passed unreported' } : null,
    ...deadlines
      .filter((d) => d.state !== 'not_needed')
      .map((d): TimelineEntry => ({ at: d.dueAt, kind: 'deadline', title: `Deadline: ${DEADLINE_LABELS[d.key].toLowerCase()}`, deadline: d })),
  ]
  return entries.filter((e): e is TimelineEntry => e !== null).sort((a, b) => a.at.localeCompare(b.at))
}
