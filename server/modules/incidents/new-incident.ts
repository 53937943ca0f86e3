import { getStockSettings } from '../stock/stock-settings.service'
import type { IncidentRow } from './incident.entity'

const HOUR = 3_600_000

type Given = Pick<
  IncidentRow,
  'status' | 'source' | 'taskId' | 'title' | 'whatHappened' | 'startedAt' | 'noticedAt' | 'tankIds' | 'batchIds' | 'affected' | 'dead'
> &
  Partial<Pick<IncidentRow, 'immediateActions' | 'filedById' | 'decisionReason' | 'decidedById' | 'decidedAt'>>

/**
 * A new incident, proposed by Roundtide or filed by a person: the three deadlines run from when
 * it was noticed, with the hours from the facility's settings at that moment; the rest of the
 * record starts empty.
 */
export async function newIncident(given: Given): Promise<Omit<IncidentRow, 'id' | 'sourceKey' | 'createdAt'>> {
  const s = await getStockSettings()
  const after = (hours: number) => new Date(given.noticedAt.getTime() + hours * HOUR)
  return {
    personIds: [],
    immediateActions: '',
    told: [],
    rootCause: '',
    correctiveActions: '',
    decisionReason: null,
    decidedById: null,
    decidedAt: null,
    filedById: null,
    welfareNotifiedAt: null,
    reportedAt: null,
    closedAt: null,
    escalatedAt: null,
    welfareEscalatedAt: null,
    reportEscalatedAt: null,
    notes: [],
    ...given,
    title: given.title.slice(0, 160),
    welfareDueAt: after(s.notifyWelfareOfficerHours),
    committeeDueAt: after(s.notifyCommitteeHours),
    reportDueAt: after(s.fullReportHours),
  }
}
