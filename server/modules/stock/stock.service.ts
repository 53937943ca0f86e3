import { In } from 'typeorm'
import type { Person } from '#shared/schemas/person'
import {
  TECHNICIAN_MOVEMENT_KINDS,
  type BatchStock,
  type Movement,
  type MovementListQuery,
  type ParsedMovementInput,
  type TankStock,
} from '#shared/schemas/stock'
import { biomassKg, round, stockingDensityKgM3 } from '#shared/stock/density'
import { balances } from '#shared/stock/ledger'
import { db } from '../../db/data-source'
import { forbidden, validationError } from '../../lib/errors'
import { batches, tanks } from '../facility/catalogues'
import { listPeople } from '../people/people.service'
import { rowFor, toEntry, writeMovement } from './movement-writer'
import { MovementEntity, type MovementRow } from './stock.entities'

const TECHNICIAN_KINDS = new Set(TECHNICIAN_MOVEMENT_KINDS)

/** A person records a movement: checked against the batch's register, refused if it would go below zero. */
export async function recordMovement(person: Person, data: ParsedMovementInput): Promise<Movement> {
  if (person.role === 'observer') throw forbidden('Observers read the stock register; they do not change it.')
  if (person.role === 'technician' && !TECHNICIAN_KINDS.has(data.kind))
    throw forbidden('Arrivals, gradings, dispatches and corrections are recorded by a supervisor or manager.')
  const batch = await batches.get(data.batchId).catch(() => null)
  if (!batch) throw validationError('That batch does not exist.', { batchId: ['Choose an existing batch'] })
  const codes = await tankCodes()
  const row = rowFor(data, person.id)
  for (const [field, tankId] of [
    ['fromTankId', row.fromTankId],
    ['toTankId', row.toTankId],
  ] as const) {
    if (tankId !== null && !codes.has(tankId))
      throw validationError('That tank does not exist.', { [data.kind === 'correction' ? 'tankId' : field]: ['Choose an existing tank'] })
  }
  if (row.occurredAt.getTime() > Date.now() + 60_000) throw validationError('A movement cannot be dated in the future.', { occurredAt: ['In the future'] })
  const saved = await db().transaction((manager) => writeMovement(manager, row, { describeTank: (id) => codes.get(id) ?? `tank ${id}` }))
  return (await toMovements([saved]))[0]
}

export async function listMovements(q: MovementListQuery): Promise<Movement[]> {
  const where = q.tankId
    ? [
        { fromTankId: q.tankId, ...(q.batchId ? { batchId: q.batchId } : {}) },
        { toTankId: q.tankId, ...(q.batchId ? { batchId: q.batchId } : {}) },
      ]
    : q.batchId
      ? { batchId: q.batchId }
      : {}
  const rows = await db()
    .getRepository(MovementEntity)
    .find({ where, order: { occurredAt: 'DESC', id: 'DESC' }, take: 2000 })
  return toMovements(rows)
}

/** Every movement up to now; reports and figures work from the whole register. */
export const allMovementRows = (batchIds?: number[]) =>
  db()
    .getRepository(MovementEntity)
    .find({ where: batchIds ? { batchId: In(batchIds) } : {}, order: { occurredAt: 'ASC', id: 'ASC' } })

export async function tankStock(tankId: number): Promise<TankStock> {
  const tank = await tanks.get(tankId)
  const rows = await db()
    .getRepository(MovementEntity)
    .find({ where: [{ fromTankId: tankId }, { toTankId: tankId }] })
  const onHand = balances(rows.map(toEntry))
  const batchRows = (await batches.list()).filter((b) => onHand.get(`${b.id}:${tankId}`))
  const held = batchRows.map((b) => {
    const count = onHand.get(`${b.id}:${tankId}`) ?? 0
    const biomass = biomassKg(count, b.meanWeightG)
    return {
      batchId: b.id,
      batchCode: b.code,
      meanWeightG: b.meanWeightG,
      count,
      biomassKg: round(biomass, 2),
      densityKgM3: roundOrNull(stockingDensityKgM3(biomass, tank.volumeL)),
    }
  })
  const count = held.reduce((s, b) => s + b.count, 0)
  const biomass = held.reduce((s, b) => s + biomassKg(b.count, b.meanWeightG), 0)
  return {
    tankId,
    tankCode: tank.code,
    volumeL: tank.volumeL,
    count,
    biomassKg: round(biomass, 2),
    densityKgM3: roundOrNull(stockingDensityKgM3(biomass, tank.volumeL)),
    batches: held,
  }
}

export async function batchStock(batchId: number): Promise<BatchStock> {
  const batch = await batches.get(batchId)
  const rows = await db().getRepository(MovementEntity).find({ where: { batchId } })
  const onHand = balances(rows.map(toEntry))
  const tankRows = await tanks.list()
  const held = tankRows
    .filter((t) => (onHand.get(`${batchId}:${t.id}`) ?? 0) > 0)
    .map((t) => {
      const count = onHand.get(`${batchId}:${t.id}`) ?? 0
      const biomass = biomassKg(count, batch.meanWeightG)
      return {
        tankId: t.id,
        tankCode: t.code,
        volumeL: t.volumeL,
        count,
        biomassKg: round(biomass, 2),
        densityKgM3: roundOrNull(stockingDensityKgM3(biomass, t.volumeL)),
      }
    })
  const count = held.reduce((s, t) => s + t.count, 0)
  const volume = held.reduce((s, t) => s + t.volumeL, 0)
  const biomass = biomassKg(count, batch.meanWeightG)
  return {
    batchId,
    batchCode: batch.code,
    meanWeightG: batch.meanWeightG,
    onRegister: rows.length > 0,
    count,
    biomassKg: round(biomass, 2),
    densityKgM3: held.length ? roundOrNull(stockingDensityKgM3(biomass, volume)) : null,
    tanks: held,
  }
}

/** Fish on the register per tank, for the round's "in this tank" beside the mortality field. */
export async function onHandByTank(): Promise<Record<number, number>> {
  const onHand = balances((await db().getRepository(MovementEntity).find()).map(toEntry))
  const out: Record<number, number> = {}
  for (const [key, n] of onHand) {
    const tankId = Number(key.split(':')[1])
    out[tankId] = (out[tankId] ?? 0) + n
  }
  return out
}

const roundOrNull = (n: number | null) => (n === null ? null : round(n, 2))

export async function tankCodes(): Promise<Map<number, string>> {
  return new Map((await tanks.list()).map((t) => [t.id, t.code]))
}

export async function toMovements(rows: MovementRow[]): Promise<Movement[]> {
  const [codes, batchRows, people] = await Promise.all([tankCodes(), batches.list(), listPeople()])
  const batchCodes = new Map(batchRows.map((b) => [b.id, b.code]))
  const names = new Map(people.map((p) => [p.id, p.name]))
  return rows.map((m) => ({
    id: m.id,
    batchId: m.batchId,
    batchCode: batchCodes.get(m.batchId) ?? `#${m.batchId}`,
    kind: m.kind,
    occurredAt: m.occurredAt.toISOString(),
    fromTankId: m.fromTankId,
    toTankId: m.toTankId,
    fromTankCode: m.fromTankId ? (codes.get(m.fromTankId) ?? null) : null,
    toTankCode: m.toTankId ? (codes.get(m.toTankId) ?? null) : null,
    count: m.count,
    meanWeightG: m.meanWeightG,
    origin: m.origin,
    permitRef: m.permitRef,
    healthCertificateRef: m.healthCertificateRef,
    transportWater: m.transportWater,
    destination: m.destination,
    reason: m.reason,
    cause: m.cause,
    causeText: m.causeText,
    necropsy: !!m.necropsy,
    correctsId: m.correctsId,
    completionId: m.completionId,
    note: m.note,
    personName: m.personId === 0 ? 'Roundtide (opening balance)' : (names.get(m.personId) ?? 'Unknown'),
    createdAt: m.createdAt.toISOString(),
  }))
}
