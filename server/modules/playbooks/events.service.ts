import { DateTime } from 'luxon'
import { FASTING_KINDS, type ParsedEventInput, type FacilityEvent, type UpdateEventInput } from '#shared/schemas/playbook'
import type { Person } from '#shared/schemas/person'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { conflict, notFound, validationError } from '../../lib/errors'
import { countEventTasks, createEventTasks, eventTasks, removeUntouchedEventTasks } from '../tasks/task-writes.service'
import { loadCatalogue } from '../tasks/targets'
import { planEventTasks } from './event-tasks'
import { holdFeedsForEvent, releaseFeedsForEvent } from './fasting'
import { EventEntity, PlaybookEntity, type EventRow } from './playbook.entities'

const events = () => db().getRepository(EventEntity)

async function toEvent(row: EventRow): Promise<FacilityEvent> {
  const taskCount = await countEventTasks(row.id)
  return {
    ...row,
    startsAt: row.startsAt.toISOString(),
    fastingFrom: row.fastingFrom?.toISOString() ?? null,
    fastingTo: row.fastingTo?.toISOString() ?? null,
    taskCount,
  }
}

export async function listEvents(from?: string, to?: string): Promise<FacilityEvent[]> {
  const qb = events().createQueryBuilder('e').orderBy('e.startsAt', 'ASC')
  if (from && to) qb.where('e.localStart BETWEEN :from AND :to', { from, to: `${to}T23:59:59` })
  return Promise.all((await qb.getMany()).map(toEvent))
}

export async function getEvent(id: number): Promise<FacilityEvent> {
  const row = await events().findOneBy({ id })
  if (!row) throw notFound('That event')
  return toEvent(row)
}

/** The event's tanks: those named, or else the batch's. */
async function resolveTanks(tankIds: number[], batchId: number | null) {
  const cat = await loadCatalogue()
  const batch = batchId ? cat.batches.get(batchId) : null
  if (batchId && !batch) throw validationError('That batch does not exist.', { batchId: ['Choose an existing batch'] })
  const ids = tankIds.length ? tankIds : (batch?.tankIds ?? [])
  const missing = ids.filter((id) => !cat.tanks.has(id))
  if (missing.length) throw validationError('Some of those tanks do not exist.', { tankIds: [`Unknown tank ids: ${missing.join(', ')}`] })
  return { cat, ids }
}

function timing(localStart: string, zone: string, fastingHours: number) {
  const start = DateTime.fromISO(localStart, { zone })
  if (!start.isValid) throw validationError('That start time is not valid.', { localStart: ['Not a valid date and time'] })
  return {
    localStart: start.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    startsAt: start.toJSDate(),
    fastingFrom: fastingHours > 0 ? start.minus({ hours: fastingHours }).toJSDate() : null,
    fastingTo: fastingHours > 0 ? start.toJSDate() : null,
  }
}

/** Starting an event creates its playbook's tasks and, for handling or dispatch, holds the feeds before it. */
export async function startEvent(data: ParsedEventInput, person: Person): Promise<FacilityEvent> {
  const playbook = await db().getRepository(PlaybookEntity).findOneBy({ id: data.playbookId })
  if (!playbook) throw validationError('That playbook does not exist.', { playbookId: ['Choose a playbook'] })
  const { cat, ids } = await resolveTanks(data.tankIds, data.batchId)
  const fastingHours = FASTING_KINDS.includes(playbook.kind) ? (data.fastingHours ?? playbook.fastingHours) : 0
  const saved = await db().transaction(async (manager) => {
    const row = await manager.getRepository(EventEntity).save({
      playbookId: playbook.id,
      kind: playbook.kind,
      title: data.title,
      tankIds: ids,
      batchId: data.batchId,
      notes: data.notes,
      status: 'planned' as const,
      createdById: person.id,
      version: 1,
      ...timing(data.localStart, cat.facility.timeZone, fastingHours),
    })
    const rows = planEventTasks(row, playbook, ids, cat)
    await createEventTasks(rows)
    await holdFeedsForEvent(row)
    return row
  })
  await audit('event', saved.id, 'create', null, saved)
  return toEvent(saved)
}

/** Moving an event or changing its tanks rebuilds its untouched tasks; started or assigned ones stay. */
export async function updateEvent(id: number, data: UpdateEventInput): Promise<FacilityEvent> {
  const current = await events().findOneBy({ id })
  if (!current) throw notFound('That event')
  if (current.status !== 'planned') throw conflict(`This event is ${current.status}; it can no longer change.`)
  const playbook = await db().getRepository(PlaybookEntity).findOneByOrFail({ id: current.playbookId })
  const { cat, ids } = await resolveTanks(data.tankIds ?? current.tankIds, current.batchId)
  const fastingHours = current.fastingFrom && current.fastingTo ? (current.fastingTo.getTime() - current.fastingFrom.getTime()) / 3_600_000 : 0
  const hours = data.fastingHours === undefined ? fastingHours : (data.fastingHours ?? 0)
  await releaseFeedsForEvent(current)
  const next: EventRow = {
    ...current,
    tankIds: ids,
    notes: data.notes ?? current.notes,
    version: current.version + 1,
    ...timing(data.localStart ?? current.localStart, cat.facility.timeZone, FASTING_KINDS.includes(current.kind) ? hours : 0),
  }
  await db().transaction(async (manager) => {
    await manager.getRepository(EventEntity).save(next)
    await removeUntouchedEventTasks(id)
    const kept = new Set((await eventTasks(id)).map((t) => `${t.title}|${t.tankId}|${t.occurrenceStart}`))
    const rows = planEventTasks(next, playbook, ids, cat).filter((r) => !kept.has(`${r.title}|${r.tankId}|${r.occurrenceStart}`))
    await createEventTasks(rows)
    await holdFeedsForEvent(next)
  })
  await audit('event', id, 'update', current, next)
  return getEvent(id)
}

/** Cancelling removes the event's untouched tasks and gives back the held feeds still ahead. */
export async function cancelEvent(id: number): Promise<FacilityEvent> {
  const current = await events().findOneBy({ id })
  if (!current) throw notFound('That event')
  if (current.status !== 'planned') throw conflict(`This event is already ${current.status}.`)
  await releaseFeedsForEvent(current)
  await removeUntouchedEventTasks(id)
  await events().update(id, { status: 'cancelled', version: current.version + 1 })
  await audit('event', id, 'update', { status: current.status }, { status: 'cancelled' })
  return getEvent(id)
}

/** Ending keeps the event's tasks as records and gives back the held feeds still ahead. */
export async function endEvent(id: number): Promise<FacilityEvent> {
  const current = await events().findOneBy({ id })
  if (!current) throw notFound('That event')
  if (current.status !== 'planned') throw conflict(`This event is already ${current.status}.`)
  await releaseFeedsForEvent(current)
  await events().update(id, { status: 'ended', version: current.version + 1 })
  await audit('event', id, 'update', { status: current.status }, { status: 'ended' })
  return getEvent(id)
}
