import { In, IsNull } from 'typeorm'
import { pickLimit } from '#shared/readings/band'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import { ReadingEntity } from '../completions/completion.entities'
import { LimitEntity, ParameterEntity } from '../parameters/parameter.entities'
import { BatchRecordEntity, EventEntity } from '../playbooks/playbook.entities'
import { TaskEntity } from '../tasks/task.entity'
import { toTask } from '../tasks/task.mapper'
import { loadTaskContext } from '../tasks/tasks.service'

/** A tank's page: its place, batches, the limits that apply there, recent tasks and events. */
export async function tankOverview(tankId: number) {
  const ctx = await loadTaskContext()
  const tank = ctx.cat.tanks.get(tankId)
  if (!tank) throw notFound('That tank')
  const batches = [...ctx.cat.batches.values()].filter((b) => b.tankIds.includes(tankId))
  const [parameters, limits, tasks, records] = await Promise.all([
    db().getRepository(ParameterEntity).find(),
    db().getRepository(LimitEntity).find(),
    db().getRepository(TaskEntity).find({ where: { tankId }, order: { dueAt: 'DESC' }, take: 40 }),
    batches.length ? db().getRepository(BatchRecordEntity).find({ where: { batchId: In(batches.map((b) => b.id)) }, order: { createdAt: 'DESC' }, take: 20 }) : [],
  ])
  const events = (await db().getRepository(EventEntity).find({ order: { startsAt: 'DESC' }, take: 100 })).filter((e) => e.tankIds.includes(tankId))
  const where = { systemId: tank.systemId, batchIds: batches.filter((b) => b.status === 'active' || b.status === 'quarantine').map((b) => b.id) }
  return {
    tank,
    area: ctx.cat.areas.get(tank.areaId) ?? null,
    system: tank.systemId ? (ctx.cat.systems.get(tank.systemId) ?? null) : null,
    batches,
    batchRecords: records.map((r) => ({ id: r.id, batchId: r.batchId, kind: r.kind, data: r.data, createdAt: r.createdAt.toISOString() })),
    limits: parameters.map((p) => {
      const l = pickLimit(limits, p.key, where)
      return { key: p.key, name: p.name, unit: p.unit, derived: p.derived, scope: l?.scope ?? null, okMin: l?.okMin ?? null, okMax: l?.okMax ?? null, criticalMin: l?.criticalMin ?? null, criticalMax: l?.criticalMax ?? null }
    }),
    recentTasks: tasks.map((t) => toTask(t, ctx)),
    events: events.map((e) => ({ id: e.id, title: e.title, kind: e.kind, localStart: e.localStart, status: e.status })),
  }
}

/** Readings for trend charts: the tank's own, its system's (chemistry sampled at the loop), and deaths per day. */
export async function tankReadings(tankId: number, from: Date, to: Date) {
  const ctx = await loadTaskContext()
  const tank = ctx.cat.tanks.get(tankId)
  if (!tank) throw notFound('That tank')
  const repo = db().getRepository(ReadingEntity)
  const qb = (column: 'tankId' | 'systemId', id: number) =>
    repo.createQueryBuilder('r').where(`r.${column} = :id`, { id }).andWhere('r.takenAt BETWEEN :from AND :to', { from, to }).andWhere({ supersededAt: IsNull() }).orderBy('r.takenAt', 'ASC').getMany()
  const own = await qb('tankId', tankId)
  const system = tank.systemId ? (await qb('systemId', tank.systemId)).filter((r) => r.tankId === null) : []
  const shape = (r: (typeof own)[number]) => ({ parameterKey: r.parameterKey, value: r.value, unit: r.unit, band: r.band, derived: r.derived, takenAt: r.takenAt.toISOString() })
  const deaths = new Map<string, number>()
  const zone = ctx.cat.facility.timeZone
  for (const r of own.filter((x) => x.parameterKey === 'mortalities')) {
    const day = new Intl.DateTimeFormat('en-CA', { timeZone: zone }).format(r.takenAt)
    deaths.set(day, (deaths.get(day) ?? 0) + r.value)
  }
  return { tank: own.map(shape), system: system.map(shape), mortalityByDay: [...deaths].map(([date, count]) => ({ date, count })) }
}

