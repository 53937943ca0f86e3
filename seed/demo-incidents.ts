// Two invented adverse events for the demo: one reported on time, one late, each with its timeline.
import { DateTime } from 'luxon'
import { db } from '#server/db/data-source'
import { IncidentEntity, type IncidentRow } from '#server/modules/incidents/incident.entity'

type NewIncident = Omit<IncidentRow, 'id' | 'createdAt'>
interface Ids {
  tanks: Map<string, number>
  batches: Map<string, number>
  supervisor: { id: number; name: string }
  manager: { id: number; name: string }
  welfareOfficer: { id: number; name: string }
}

const HOUR = 3_600_000

/** Deadlines as the facility's defaults set them: 24 h, 72 h and 7 days from when it was noticed. */
const deadlines = (noticed: Date) => ({
  welfareDueAt: new Date(noticed.getTime() + 24 * HOUR),
  committeeDueAt: new Date(noticed.getTime() + 72 * HOUR),
  reportDueAt: new Date(noticed.getTime() + 168 * HOUR),
})

export async function seedIncidents(zone: string, ids: Ids): Promise<number> {
  const today = DateTime.now().setZone(zone).startOf('day')
  const at = (daysAgo: number, time: string) => {
    const [hour, minute] = time.split(':').map(Number)
    return today.minus({ days: daysAgo }).set({ hour, minute }).toJSDate()
  }
  const note = (daysAgo: number, time: string, who: { id: number; name: string }, text: string) => ({
    at: at(daysAgo, time).toISOString(),
    personId: who.id,
    personName: who.name,
    text,
  })
  const told = (daysAgo: number, time: string, who: string) => ({ who, at: at(daysAgo, time).toISOString() })

  const nurseryNoticed = at(41, '07:40')
  const onTime: NewIncident = {
    status: 'closed',
    source: 'mortality_threshold',
    sourceKey: 'demo:nursery-salinity',
    taskId: null,
    title: 'Deaths above the 7-day threshold in NUR-T02',
    whatHappened: '68 dead removed from NUR-T02 at the morning check and 41 the next day (2.2 % of the batch in 7 days); fish gasping at the surface.',
    startedAt: at(42, '16:00'),
    noticedAt: nurseryNoticed,
    tankIds: [ids.tanks.get('NUR-T02')!],
    batchIds: [ids.batches.get('B-NUR-APR')!],
    personIds: [ids.supervisor.id, ids.welfareOfficer.id],
    affected: 831,
    dead: 109,
    immediateActions: 'Salinity step reversed; 50 % water exchange; feeding held for 24 h; two fish kept chilled for necropsy.',
    told: [told(41, '08:30', `${ids.welfareOfficer.name}, welfare officer (phone)`), told(39, '14:00', 'Animal ethics committee chair (e-mail)')],
    rootCause: 'Salinity raised 6 ppt in one step during the brackish transition; gill irritation confirmed at necropsy.',
    correctiveActions: 'Nursery salinity changes limited to 2 ppt a day; each step now needs a supervisor sign-off on its task.',
    decisionReason: 'Confirmed: 68 dead overnight and more gasping at the surface.',
    decidedById: ids.supervisor.id,
    decidedAt: at(41, '08:15'),
    filedById: null,
    ...deadlines(nurseryNoticed),
    welfareNotifiedAt: at(41, '08:30'),
    reportedAt: at(39, '14:00'),
    closedAt: at(36, '10:00'),
    escalatedAt: null,
    welfareEscalatedAt: null,
    reportEscalatedAt: null,
    notes: [
      note(41, '11:00', ids.welfareOfficer, 'Two fish to the lab: gills pale and swollen, no parasites seen.'),
      note(36, '09:30', ids.welfareOfficer, 'Full report read; corrective actions accepted.'),
    ],
  }

  const trialNoticed = at(20, '08:10')
  const due = deadlines(trialNoticed)
  const late: NewIncident = {
    status: 'closed',
    source: 'critical_recheck',
    sourceKey: 'demo:trial-air-line',
    taskId: null,
    title: 'Critical reading confirmed by its recheck: Morning tank check (TRL-A07)',
    whatHappened: 'DO 3.1 mg/L at the morning check in TRL-A07 and 3.0 mg/L at the recheck 30 minutes later; 4 dead.',
    startedAt: at(21, '23:00'),
    noticedAt: trialNoticed,
    tankIds: [ids.tanks.get('TRL-A07')!],
    batchIds: [ids.batches.get('B-TRIAL')!],
    personIds: [ids.supervisor.id],
    affected: 48,
    dead: 4,
    immediateActions: 'Air line joined with a spare connector; DO back above 6 mg/L by 09:00; feeding held for the day.',
    told: [told(20, '09:00', `${ids.welfareOfficer.name}, welfare officer (in person)`), told(15, '16:00', 'Animal ethics committee chair (e-mail)')],
    rootCause: 'The air line to the diffuser split where it crosses the walkway; the trial tanks had no low-DO alarm of their own.',
    correctiveActions: 'Air lines rerouted under the grating; DO probes on TRL-A07 and TRL-A12 wired to the alarm panel.',
    decisionReason: 'Confirmed: the recheck read critical again.',
    decidedById: ids.supervisor.id,
    decidedAt: at(20, '08:20'),
    filedById: null,
    ...due,
    welfareNotifiedAt: at(20, '09:00'),
    reportedAt: at(15, '16:00'),
    closedAt: at(9, '11:00'),
    // Both later deadlines passed before they were met, so each climbed the ladder once.
    escalatedAt: due.committeeDueAt,
    welfareEscalatedAt: null,
    reportEscalatedAt: due.reportDueAt,
    notes: [
      note(15, '15:50', ids.manager, 'Committee notice sent two days late: the draft waited while the supervisor was on leave.'),
      note(9, '11:30', ids.welfareOfficer, 'Necropsy: gill changes consistent with low oxygen. Report accepted.'),
    ],
  }
  await db().getRepository(IncidentEntity).insert([onTime, late])
  return 2
}
