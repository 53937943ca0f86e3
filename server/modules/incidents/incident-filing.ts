import type { FileIncidentInput, Incident } from '#shared/schemas/incident'
import type { Role } from '#shared/schemas/person'
import { db } from '../../db/data-source'
import { validationError } from '../../lib/errors'
import { audit } from '../audit/audit.service'
import { batches, tanks } from '../facility/catalogues'
import { IncidentEntity } from './incident.entity'
import { newIncident } from './new-incident'

// A phone's clock may run a little ahead of the server's; more than this is a typing mistake.
const CLOCK_SKEW_MS = 5 * 60_000

type Filer = { id: number; name: string; role: Role }

async function mustAllExist(ids: number[], known: Promise<Array<{ id: number }>>, field: string, label: string) {
  const existing = new Set((await known).map((r) => r.id))
  if (ids.some((id) => !existing.has(id)))
    throw validationError(`Nothing was filed: a ${label} chosen does not exist.`, { [field]: [`Choose existing ${label}s`] })
}

/**
 * An incident a person saw and Roundtide could not. A supervisor or manager files it confirmed
 * (open); a technician, often the first at the tank, files it as a proposal that a supervisor
 * confirms or dismisses like Roundtide's own. The deadlines run from when it was noticed either
 * way, and the welfare officer's runs while the proposal waits.
 */
export async function insertFiledIncident(input: FileIncidentInput, who: Filer, now = new Date()): Promise<Pick<Incident, 'id'>> {
  const future = (['startedAt', 'noticedAt'] as const).filter((k) => Date.parse(input[k]) > now.getTime() + CLOCK_SKEW_MS)
  if (future.length)
    throw validationError(
      'Nothing was filed: an incident cannot start or be noticed in the future.',
      Object.fromEntries(future.map((k) => [k, ['Not in the future']])),
    )
  await mustAllExist(input.tankIds, tanks.list(), 'tankIds', 'tank')
  await mustAllExist(input.batchIds, batches.list(), 'batchIds', 'batch')
  const confirmed = who.role === 'manager' || who.role === 'supervisor'
  const row = await newIncident({
    ...input,
    status: confirmed ? 'open' : 'proposed',
    source: 'manual',
    taskId: null,
    startedAt: new Date(input.startedAt),
    noticedAt: new Date(input.noticedAt),
    filedById: who.id,
    // Filing by a supervisor or manager is the decision; a technician's waits for one.
    ...(confirmed ? { decidedById: who.id, decidedAt: now } : {}),
  })
  const { identifiers } = await db().getRepository(IncidentEntity).insert(row)
  const id = Number(identifiers[0].id)
  // The audit row also tells the live feed (kind "incident").
  await audit('incident', id, 'create', null, { id, ...row })
  return { id }
}
