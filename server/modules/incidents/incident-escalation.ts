import { In, IsNull, LessThanOrEqual } from 'typeorm'
import type { IncidentStatus } from '#shared/schemas/incident'
import { db } from '../../db/data-source'
import { startIncidentAlert, type IncidentAlertKind } from '../completions/follow-ups'
import { IncidentEntity, type IncidentRow } from './incident.entity'

type DateColumn = { [K in keyof IncidentRow]: IncidentRow[K] extends Date | null ? K : never }[keyof IncidentRow]

interface DeadlineRule {
  due: DateColumn
  /** The date that meets the deadline; while it is empty past the due time the deadline is overdue. */
  done: DateColumn
  /** Claimed by a conditional update, so two ticks never start two alerts for one deadline. */
  claim: DateColumn
  statuses: IncidentStatus[]
  kind: IncidentAlertKind
  say: string
}

/**
 * The three deadlines, each escalating once. The welfare officer is to be told even while a
 * proposal waits for its decision; the committee and the full report follow a confirmed incident.
 */
export const DEADLINE_RULES: DeadlineRule[] = [
  {
    due: 'welfareDueAt',
    done: 'welfareNotifiedAt',
    claim: 'welfareEscalatedAt',
    statuses: ['proposed', 'open', 'reported'],
    kind: 'incident_welfare_overdue',
    say: 'welfare officer not told by the deadline',
  },
  {
    due: 'committeeDueAt',
    done: 'reportedAt',
    claim: 'escalatedAt',
    statuses: ['open'],
    kind: 'incident_overdue',
    say: 'not reported to the ethics committee by its deadline',
  },
  {
    due: 'reportDueAt',
    done: 'closedAt',
    claim: 'reportEscalatedAt',
    statuses: ['open', 'reported'],
    kind: 'incident_report_overdue',
    say: 'full report not filed by its deadline',
  },
]

/** Every deadline passed without its date climbs a ladder once: the incident's task's, or for one filed by hand the standard ladder. */
export async function escalateOverdueIncidents(now: Date): Promise<number> {
  const repo = db().getRepository(IncidentEntity)
  let started = 0
  for (const rule of DEADLINE_RULES) {
    const due = await repo.find({ where: { status: In(rule.statuses), [rule.done]: IsNull(), [rule.claim]: IsNull(), [rule.due]: LessThanOrEqual(now) } })
    for (const incident of due) {
      const claimed = await repo.update({ id: incident.id, [rule.claim]: IsNull() }, { [rule.claim]: now })
      if (!claimed.affected) continue
      await startIncidentAlert(incident, `Incident #${incident.id} ${rule.say}: ${incident.title}`, now, rule.kind)
      started++
    }
  }
  return started
}
