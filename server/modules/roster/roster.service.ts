import { DateTime } from 'luxon'
import { Between, LessThan, MoreThan } from 'typeorm'
import {
  ShiftInputSchema,
  WEEKDAYS,
  type OnCallDuty,
  type OnCallInput,
  type Shift,
  type ShiftInput,
  type ShiftPatch,
  type ShiftPatternInput,
} from '#shared/schemas/roster'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { notFound, validationError } from '../../lib/errors'
import { getFacility } from '../facility/facility.service'
import { findPerson, personNames as names } from '../people/person-reads'
import { OnCallEntity, ShiftEntity, type OnCallRow, type ShiftRow } from './roster.entities'

const toShift = (row: ShiftRow, n: ReadonlyMap<number, string>): Shift => ({ ...row, personName: n.get(row.personId) ?? 'Unknown' })
const toDuty = (row: OnCallRow, n: ReadonlyMap<number, string>): OnCallDuty => ({
  id: row.id,
  personId: row.personId,
  personName: n.get(row.personId) ?? 'Unknown',
  fromDate: row.fromDate,
  toDate: row.toDate,
  startsAt: row.startsAt.toISOString(),
  endsAt: row.endsAt.toISOString(),
})

export async function listShifts(from: string, to: string): Promise<Shift[]> {
  const rows = await db()
    .getRepository(ShiftEntity)
    .find({ where: { date: Between(from, to) }, order: { date: 'ASC', start: 'ASC' } })
  const n = await names()
  return rows.map((r) => toShift(r, n))
}

async function assertPerson(personId: number) {
  const person = await findPerson(personId)
  if (!person || !person.active) throw validationError('Choose an active person.', { personId: ['Not an active person'] })
  return person
}

export async function createShift(data: ShiftInput): Promise<Shift> {
  await assertPerson(data.personId)
  const row = await db().getRepository(ShiftEntity).save(data)
  await audit('shift', row.id, 'create', null, row)
  return toShift(row, await names())
}

export async function updateShift(id: number, patch: ShiftPatch): Promise<Shift> {
  const repo = db().getRepository(ShiftEntity)
  const current = await repo.findOneBy({ id })
  if (!current) throw notFound('That shift')
  // The changed fields were checked by the route; this checks the whole shift they make.
  const data = ShiftInputSchema.parse({ ...current, ...patch })
  await assertPerson(data.personId)
  const saved = await repo.save({ ...current, ...data })
  await audit('shift', id, 'update', current, saved)
  return toShift(saved, await names())
}

export async function deleteShift(id: number) {
  const before = await db().getRepository(ShiftEntity).findOneBy({ id })
  if (!before) throw notFound('That shift')
  await db().getRepository(ShiftEntity).delete(id)
  await audit('shift', id, 'delete', before, null)
}

/** A weekly pattern becomes shifts for each matching day; a day the person already works is left alone. */
export async function applyShiftPattern(p: ShiftPatternInput): Promise<{ created: number; skipped: number }> {
  await assertPerson(p.personId)
  const repo = db().getRepository(ShiftEntity)
  const existing = new Set((await repo.find({ where: { personId: p.personId, date: Between(p.from, p.to) } })).map((s) => s.date))
  const rows: Array<Omit<ShiftRow, 'id'>> = []
  let skipped = 0
  for (let d = DateTime.fromISO(p.from); d <= DateTime.fromISO(p.to); d = d.plus({ days: 1 })) {
    if (!p.weekdays.includes(WEEKDAYS[d.weekday - 1])) continue
    const date = d.toISODate()!
    if (existing.has(date)) skipped++
    else rows.push({ personId: p.personId, date, start: p.start, end: p.end, kind: p.kind })
  }
  if (rows.length) await repo.insert(rows)
  if (rows.length) await audit('shift', `pattern:${p.personId}`, 'create', null, { pattern: p, created: rows.length })
  return { created: rows.length, skipped }
}

/** The instants a duty covers: handover time on its first day to handover time on its last. */
export async function dutyInstants(fromDate: string, toDate: string) {
  const f = await getFacility()
  const at = (date: string) => DateTime.fromISO(`${date}T${f.handoverTime}`, { zone: f.timeZone }).toJSDate()
  return { startsAt: at(fromDate), endsAt: at(toDate) }
}

export async function listOnCall(from: string, to: string): Promise<OnCallDuty[]> {
  const rows = await db()
    .getRepository(OnCallEntity)
    .find({ where: { fromDate: LessThan(to + 'z'), toDate: MoreThan(from) }, order: { startsAt: 'ASC' } })
  const n = await names()
  return rows.map((r) => toDuty(r, n))
}

export async function createOnCall(data: OnCallInput): Promise<OnCallDuty> {
  const person = await assertPerson(data.personId)
  if (!person.onCallEligible) throw validationError(`${person.name} is not set up to hold on-call duty.`, { personId: ['Not eligible for on-call'] })
  const row = await db()
    .getRepository(OnCallEntity)
    .save({ ...data, ...(await dutyInstants(data.fromDate, data.toDate)) })
  await audit('on_call', row.id, 'create', null, row)
  return toDuty(row, await names())
}

export async function deleteOnCall(id: number) {
  const before = await db().getRepository(OnCallEntity).findOneBy({ id })
  if (!before) throw notFound('That on-call duty')
  await db().getRepository(OnCallEntity).delete(id)
  await audit('on_call', id, 'delete', before, null)
}

/** Who holds on-call duty at an instant (the latest-starting duty wins an overlap). */
export async function onCallAt(at: Date): Promise<OnCallDuty | null> {
  const row = await db()
    .getRepository(OnCallEntity)
    .findOne({ where: { startsAt: LessThan(new Date(at.getTime() + 1)), endsAt: MoreThan(at) }, order: { startsAt: 'DESC' } })
  return row ? toDuty(row, await names()) : null
}
