import type { DecideIncidentInput, FileIncidentInput, Incident, IncidentNoteInput, UpdateIncidentInput } from '#shared/schemas/incident'
import type { Role } from '#shared/schemas/person'
import { welfareToldAt } from '#shared/incidents/deadlines'
import { db } from '../../db/data-source'
import { recordChange } from '../../realtime/change-outbox'
import { conflict, notFound, validationError } from '../../lib/errors'
import { closeIncidentAlert } from '../completions/follow-ups'
import { listPeople } from '../people/people.service'
import { DEADLINE_RULES } from './incident-escalation'
import { insertFiledIncident } from './incident-filing'
import { IncidentEntity, type IncidentRow } from './incident.entity'

// The clock and the scheduler reach proposals and escalation through this service.
export { proposeForCriticalRecheck, proposeForMissedTasks, proposeForMortalityThreshold, proposeIncident } from './incident-proposals'
export { escalateOverdueIncidents } from './incident-escalation'

const repo = () => db().getRepository(IncidentEntity)
const iso = (d: Date | null) => (d ? d.toISOString() : null)

/** `names` (person id → name) lets observers, who cannot list the staff, read who decided and who was involved. */
export function toIncident(r: IncidentRow, names: ReadonlyMap<number, string> = new Map()): Incident {
  const { sourceKey: _k, createdAt: _c, ...rest } = r
  return {
    ...rest,
    decidedByName: r.decidedById ? (names.get(r.decidedById) ?? null) : null,
    filedByName: r.filedById ? (names.get(r.filedById) ?? null) : null,
    people: r.personIds.map((id) => ({ id, name: names.get(id) ?? `Person ${id}` })),
    startedAt: r.startedAt.toISOString(),
    noticedAt: r.noticedAt.toISOString(),
    decidedAt: iso(r.decidedAt),
    welfareDueAt: r.welfareDueAt.toISOString(),
    committeeDueAt: r.committeeDueAt.toISOString(),
    reportDueAt: r.reportDueAt.toISOString(),
    welfareNotifiedAt: iso(r.welfareNotifiedAt),
    reportedAt: iso(r.reportedAt),
    closedAt: iso(r.closedAt),
    escalatedAt: iso(r.escalatedAt),
    welfareEscalatedAt: iso(r.welfareEscalatedAt),
    reportEscalatedAt: iso(r.reportEscalatedAt),
  }
}

const personNames = async () => new Map((await listPeople()).map((p) => [p.id, p.name]))

export async function listIncidents(): Promise<Incident[]> {
  const [rows, names] = await Promise.all([repo().find({ order: { noticedAt: 'DESC', id: 'DESC' }, take: 500 }), personNames()])
  return rows.map((r) => toIncident(r, names))
}

async function load(id: number) {
  const row = await repo().findOneBy({ id })
  if (!row) throw notFound('That incident')
  return row
}

export const getIncident = async (id: number) => toIncident(await load(id), await personNames())

type Actor = { id: number; name: string }

/** A person files what Roundtide could not see; answered as the whole incident. */
export async function fileIncident(input: FileIncidentInput, who: Actor & { role: Role }, now = new Date()): Promise<Incident> {
  return getIncident((await insertFiledIncident(input, who, now)).id)
}

/** Confirm or dismiss a proposal, always with a reason that stays on the record. */
export async function decideIncident(id: number, decision: 'confirm' | 'dismiss', { reason }: DecideIncidentInput, who: Actor, now = new Date()) {
  const result = await repo().update(
    { id, status: 'proposed' },
    { status: decision === 'confirm' ? 'open' : 'dismissed', decisionReason: reason, decidedById: who.id, decidedAt: now },
  )
  if (!result.affected) {
    const row = await load(id)
    throw conflict(`This incident is already ${row.status}; nothing was changed.`)
  }
  const decided = await load(id)
  await closeSettledDeadlineAlerts(decided, now)
  await recordChange('incident', [id])
  return getIncident(id)
}

export async function updateIncident(id: number, data: UpdateIncidentInput, now = new Date()) {
  const row = await load(id)
  if (row.status === 'proposed' || row.status === 'dismissed') throw conflict('Confirm the incident before filling in its record.')
  const { status, startedAt, noticedAt, welfareNotifiedAt, ...fields } = data
  const next: Partial<IncidentRow> = { ...fields }
  if (startedAt) next.startedAt = new Date(startedAt)
  if (noticedAt) next.noticedAt = new Date(noticedAt)
  // The first deadline is judged as the screens judge it: the time given, else the first person told.
  const welfareTold = welfareToldAt({ welfareNotifiedAt: welfareNotifiedAt ?? iso(row.welfareNotifiedAt), told: next.told ?? row.told })
  if (welfareTold) next.welfareNotifiedAt = new Date(welfareTold)
  if (status === 'reported' && !row.reportedAt) Object.assign(next, { status, reportedAt: now })
  if (status === 'closed') {
    // Closing files the full report (the third deadline), so the report must say why and what changes.
    const missing = (['rootCause', 'correctiveActions'] as const).filter((k) => !(next[k] ?? row[k]).trim())
    if (missing.length)
      throw validationError(
        'Nothing was saved: the full report needs the root cause and the corrective actions before the incident is closed.',
        Object.fromEntries(missing.map((k) => [k, ['Required to close']])),
      )
    Object.assign(next, { status, closedAt: now, reportedAt: row.reportedAt ?? now })
  }
  // An empty patch changes nothing (TypeORM refuses an UPDATE without values).
  if (Object.keys(next).length) await repo().update(id, next)
  await closeSettledDeadlineAlerts({ ...row, ...next }, now)
  await recordChange('incident', [id])
  return getIncident(id)
}

/**
 * A deadline met after it escalated stops its alert climbing the ladder; so does every deadline
 * of a dismissed proposal (the welfare one escalates while the proposal waits), none being needed.
 */
async function closeSettledDeadlineAlerts(row: IncidentRow, now: Date) {
  for (const rule of DEADLINE_RULES) {
    if (row[rule.claim] && (row[rule.done] || row.status === 'dismissed')) await closeIncidentAlert(row.id, rule.kind, now)
  }
}

/** Observers (veterinarian, welfare officer) may add a note; nothing else. */
export async function addIncidentNote(id: number, { text }: IncidentNoteInput, who: Actor, now = new Date()) {
  const row = await load(id)
  await repo().update(id, { notes: [...row.notes, { at: now.toISOString(), personId: who.id, personName: who.name, text }] })
  await recordChange('incident', [id])
  return getIncident(id)
}
