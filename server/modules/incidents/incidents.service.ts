import { IsNull, LessThanOrEqual } from 'typeorm'
import {
  DecideIncidentInputSchema,
  IncidentNoteInputSchema,
  UpdateIncidentInputSchema,
  type Incident,
} from '#shared/schemas/incident'
import { db } from '../../db/data-source'
import { recordChange } from '../../realtime/change-outbox'
import { conflict, notFound } from '../../lib/errors'
import { startIncidentAlert } from '../completions/follow-ups'
import { getStockSettings } from '../stock/stock-settings.service'
import { IncidentEntity, type IncidentRow } from './incident.entity'

const repo = () => db().getRepository(IncidentEntity)
const HOUR = 3_600_000
const iso = (d: Date | null) => (d ? d.toISOString() : null)

export function toIncident(r: IncidentRow): Incident {
  const { sourceKey: _k, createdAt: _c, ...rest } = r
  return {
    ...rest,
    startedAt: r.startedAt.toISOString(), noticedAt: r.noticedAt.toISOString(), decidedAt: iso(r.decidedAt),
    welfareDueAt: r.welfareDueAt.toISOString(), committeeDueAt: r.committeeDueAt.toISOString(), reportDueAt: r.reportDueAt.toISOString(),
    reportedAt: iso(r.reportedAt), closedAt: iso(r.closedAt), escalatedAt: iso(r.escalatedAt),
  }
}

export interface IncidentProposal {
  source: 'missed_task' | 'critical_recheck' | 'mortality_threshold'
  sourceKey: string
  taskId: number
  title: string
  whatHappened: string
  startedAt: Date
  tankIds: number[]
  batchIds?: number[]
  dead?: number
}

/**
 * Roundtide proposes, a person decides: the row starts as "proposed" and nothing is reported
 * until a supervisor or manager confirms it. Deadlines run from when it was noticed, with the
 * hours from the facility's settings. One proposal per cause (unique source key).
 */
export async function proposeIncident(p: IncidentProposal, now: Date): Promise<void> {
  const s = await getStockSettings()
  await repo()
    .createQueryBuilder()
    .insert()
    .values({
      status: 'proposed', source: p.source, sourceKey: p.sourceKey, taskId: p.taskId, title: p.title.slice(0, 160), whatHappened: p.whatHappened,
      startedAt: p.startedAt, noticedAt: now, tankIds: p.tankIds, batchIds: p.batchIds ?? [], personIds: [], affected: p.dead ?? 0, dead: p.dead ?? 0,
      immediateActions: '', told: [], rootCause: '', correctiveActions: '', decisionReason: null, decidedById: null, decidedAt: null,
      welfareDueAt: new Date(now.getTime() + s.notifyWelfareOfficerHours * HOUR),
      committeeDueAt: new Date(now.getTime() + s.notifyCommitteeHours * HOUR),
      reportDueAt: new Date(now.getTime() + s.fullReportHours * HOUR),
      reportedAt: null, closedAt: null, escalatedAt: null, notes: [],
    })
    .orIgnore()
    .execute()
  await recordChange('incident')
}

export async function listIncidents(): Promise<Incident[]> {
  return (await repo().find({ order: { noticedAt: 'DESC', id: 'DESC' }, take: 500 })).map(toIncident)
}

async function load(id: number) {
  const row = await repo().findOneBy({ id })
  if (!row) throw notFound('That incident')
  return row
}

export const getIncident = async (id: number) => toIncident(await load(id))

type Actor = { id: number; name: string }

/** Confirm or dismiss a proposal, always with a reason that stays on the record. */
export async function decideIncident(id: number, decision: 'confirm' | 'dismiss', input: unknown, who: Actor, now = new Date()) {
  const { reason } = DecideIncidentInputSchema.parse(input)
  const result = await repo().update({ id, status: 'proposed' }, { status: decision === 'confirm' ? 'open' : 'dismissed', decisionReason: reason, decidedById: who.id, decidedAt: now })
  if (!result.affected) {
    const row = await load(id)
    throw conflict(`This incident is already ${row.status}; nothing was changed.`)
  }
  await recordChange('incident', [id])
  return getIncident(id)
}

export async function updateIncident(id: number, input: unknown, now = new Date()) {
  const data = UpdateIncidentInputSchema.parse(input)
  const row = await load(id)
  if (row.status === 'proposed' || row.status === 'dismissed') throw conflict('Confirm the incident before filling in its record.')
  const { status, startedAt, noticedAt, ...fields } = data
  const next: Partial<IncidentRow> = { ...fields }
  if (startedAt) next.startedAt = new Date(startedAt)
  if (noticedAt) next.noticedAt = new Date(noticedAt)
  if (status === 'reported' && !row.reportedAt) Object.assign(next, { status, reportedAt: now })
  if (status === 'closed') Object.assign(next, { status, closedAt: now, reportedAt: row.reportedAt ?? now })
  await repo().update(id, next)
  await recordChange('incident', [id])
  return getIncident(id)
}

/** Observers (veterinarian, welfare officer) may add a note; nothing else. */
export async function addIncidentNote(id: number, input: unknown, who: Actor, now = new Date()) {
  const { text } = IncidentNoteInputSchema.parse(input)
  const row = await load(id)
  await repo().update(id, { notes: [...row.notes, { at: now.toISOString(), personId: who.id, personName: who.name, text }] })
  await recordChange('incident', [id])
  return getIncident(id)
}

/**
 * A confirmed incident not yet reported when its committee deadline passes climbs the ladder
 * once: escalatedAt is claimed by a conditional update, so two ticks never start two alerts.
 */
export async function escalateOverdueIncidents(now: Date): Promise<number> {
  const due = await repo().find({ where: { status: 'open', escalatedAt: IsNull(), committeeDueAt: LessThanOrEqual(now) } })
  let started = 0
  for (const incident of due) {
    const claimed = await repo().update({ id: incident.id, escalatedAt: IsNull() }, { escalatedAt: now })
    if (!claimed.affected || !incident.taskId) continue
    await startIncidentAlert(incident.taskId, `Incident #${incident.id} not reported to the ethics committee by its deadline: ${incident.title}`, now)
    started++
  }
  return started
}

/** Missed welfare-critical checks: one proposal each (the clock passes the tasks it just marked missed). */
export async function proposeForMissedTasks(tasks: Array<{ id: number; title: string; tankId: number | null; graceUntil: Date }>, now: Date) {
  for (const t of tasks) {
    await proposeIncident({ source: 'missed_task', sourceKey: `missed_task:${t.id}`, taskId: t.id, title: `Missed welfare-critical check: ${t.title}`, whatHappened: `"${t.title}" was not done within its grace time.`, startedAt: t.graceUntil, tankIds: t.tankId ? [t.tankId] : [] }, now)
  }
}

