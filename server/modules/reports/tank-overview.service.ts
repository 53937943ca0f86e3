import { pickLimit } from '#shared/readings/band'
import type { TankOverview, TankReadings, TrendReading } from '#shared/schemas/tank-page'
import { notFound } from '../../lib/errors'
import { currentReadingsAt, type ReadingRow } from '../completions/reading-lookups'
import { listLimits, listParameters } from '../parameters/parameters.service'
import { latestBatchRecords, latestEventsOfTank } from '../playbooks/playbook-lookups'
import { latestTasksOfTank } from '../tasks/task-queries'
import { toTask } from '../tasks/task.mapper'
import { loadTaskContext } from '../tasks/tasks.service'

/** A tank's page: its place, batches, the limits that apply there, recent tasks and events. */
export async function tankOverview(tankId: number): Promise<TankOverview> {
  const ctx = await loadTaskContext()
  const tank = ctx.cat.tanks.get(tankId)
  if (!tank) throw notFound('That tank')
  const batches = [...ctx.cat.batches.values()].filter((b) => b.tankIds.includes(tankId))
  const [parameters, limits, tasks, records] = await Promise.all([
    listParameters(),
    listLimits(),
    latestTasksOfTank(tankId, 40),
    latestBatchRecords(
      batches.map((b) => b.id),
      20,
    ),
  ])
  const events = await latestEventsOfTank(tankId, 100)
  const where = { systemId: tank.systemId, batchIds: batches.filter((b) => b.status === 'active' || b.status === 'quarantine').map((b) => b.id) }
  return {
    tank,
    area: ctx.cat.areas.get(tank.areaId) ?? null,
    system: tank.systemId ? (ctx.cat.systems.get(tank.systemId) ?? null) : null,
    batches,
    batchRecords: records.map((r) => ({ id: r.id, batchId: r.batchId, kind: r.kind, data: r.data, createdAt: r.createdAt.toISOString() })),
    limits: parameters.map((p) => {
      const l = pickLimit(limits, p.key, where)
      return {
        key: p.key,
        name: p.name,
        unit: p.unit,
        derived: p.derived,
        scope: l?.scope ?? null,
        okMin: l?.okMin ?? null,
        okMax: l?.okMax ?? null,
        criticalMin: l?.criticalMin ?? null,
        criticalMax: l?.criticalMax ?? null,
      }
    }),
    recentTasks: tasks.map((t) => toTask(t, ctx)),
    events: events.map((e) => ({ id: e.id, title: e.title, kind: e.kind, localStart: e.localStart, status: e.status })),
  }
}

const toTrendReading = (r: ReadingRow): TrendReading => ({
  parameterKey: r.parameterKey,
  value: r.value,
  unit: r.unit,
  band: r.band,
  derived: r.derived,
  takenAt: r.takenAt.toISOString(),
})

/** Readings for trend charts: the tank's own, its system's (chemistry sampled at the loop), and deaths per day. */
export async function tankReadings(tankId: number, from: Date, to: Date): Promise<TankReadings> {
  const ctx = await loadTaskContext()
  const tank = ctx.cat.tanks.get(tankId)
  if (!tank) throw notFound('That tank')
  const own = await currentReadingsAt('tankId', tankId, from, to)
  const system = tank.systemId ? (await currentReadingsAt('systemId', tank.systemId, from, to)).filter((r) => r.tankId === null) : []
  const deaths = new Map<string, number>()
  const zone = ctx.cat.facility.timeZone
  for (const r of own.filter((x) => x.parameterKey === 'mortalities')) {
    const day = new Intl.DateTimeFormat('en-CA', { timeZone: zone }).format(r.takenAt)
    deaths.set(day, (deaths.get(day) ?? 0) + r.value)
  }
  return { tank: own.map(toTrendReading), system: system.map(toTrendReading), mortalityByDay: [...deaths].map(([date, count]) => ({ date, count })) }
}
