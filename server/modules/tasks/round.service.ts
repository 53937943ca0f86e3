import { DateTime } from 'luxon'
import { pickLimit } from '#shared/readings/band'
import type { Person } from '#shared/schemas/person'
import type { Round, RoundTask } from '#shared/schemas/round'
import { db } from '../../db/data-source'
import { listLimits, listParameters } from '../parameters/parameters.service'
import { rationsForDay } from './rations'
import type { SelectQueryBuilder } from 'typeorm'
import { TaskEntity, type TaskRow } from './task.entity'
import { toTask } from './task.mapper'
import { loadTaskContext } from './tasks.service'

/**
 * One person's round for a facility day: their tasks plus unassigned ones they may take,
 * in walking order (areas by round order, quarantine last), then by tank and time.
 */
export async function getRound(person: Person, date?: string): Promise<Round> {
  return roundFor(date, (qb) => qb.andWhere('(t.assigneeId = :me OR t.assigneeId IS NULL)', { me: person.id }))
}

/** The paper backup: one person's or one area's tasks of a day, in walking order. */
export async function getRoundSheet(date: string, filter: { personId?: number; areaId?: number }): Promise<Round> {
  return roundFor(date, (qb) => {
    if (filter.personId) qb.andWhere('t.assigneeId = :personId', { personId: filter.personId })
    if (filter.areaId) qb.andWhere('t.areaId = :areaId', { areaId: filter.areaId })
    qb.andWhere("t.status <> 'held'")
  })
}

async function roundFor(date: string | undefined, narrow: (qb: SelectQueryBuilder<TaskRow>) => void): Promise<Round> {
  const ctx = await loadTaskContext()
  const zone = ctx.cat.facility.timeZone
  const day = date ?? DateTime.now().setZone(zone).toISODate()!
  const qb = db().getRepository(TaskEntity).createQueryBuilder('t').where('t.localDate = :day', { day })
  narrow(qb)
  const rows = await qb.orderBy('t.dueAt', 'ASC').getMany()
  const [parameters, limits] = await Promise.all([listParameters(), listLimits()])
  const paramByKey = new Map(parameters.map((p) => [p.key, p]))
  const areas = [...ctx.cat.areas.values()].sort((a, b) => Number(a.quarantine) - Number(b.quarantine) || a.roundOrder - b.roundOrder)
  const areaRank = new Map(areas.map((a, i) => [a.id, i]))
  const batches = [...ctx.cat.batches.values()].filter((b) => b.status === 'active' || b.status === 'quarantine')

  const rations = await rationsForDay(day, [...new Set(rows.filter((r) => r.category === 'feeding' && r.tankId).map((r) => r.tankId!))], ctx.cat)
  const tasks: RoundTask[] = rows.map((row) => {
    const tank = row.tankId ? ctx.cat.tanks.get(row.tankId) : undefined
    const systemId = row.targetKind === 'system' ? row.targetId : (tank?.systemId ?? null)
    const where = { systemId, batchIds: batches.filter((b) => tank && b.tankIds.includes(tank.id)).map((b) => b.id) }
    return {
      ...toTask(row, ctx),
      rationG: rations.get(row.id) ?? null,
      salinitySetpoint: systemId ? (ctx.cat.systems.get(systemId)?.salinitySetpoint ?? null) : null,
      readingSpecs: row.requiredReadings.flatMap((key) => {
        const p = paramByKey.get(key)
        if (!p) return []
        const l = pickLimit(limits, key, where)
        return [
          {
            key,
            name: p.name,
            unit: p.unit,
            decimals: p.decimals,
            physicalMin: p.physicalMin,
            physicalMax: p.physicalMax,
            okMin: l?.okMin ?? null,
            okMax: l?.okMax ?? null,
            criticalMin: l?.criticalMin ?? null,
            criticalMax: l?.criticalMax ?? null,
          },
        ]
      }),
    }
  })
  tasks.sort(
    (a, b) =>
      (areaRank.get(a.areaId ?? -1) ?? 99) - (areaRank.get(b.areaId ?? -1) ?? 99) ||
      a.targetLabel.localeCompare(b.targetLabel) ||
      a.dueAt.localeCompare(b.dueAt),
  )
  return { date: day, timeZone: zone, areas: areas.map(({ id, name, roundOrder, quarantine }) => ({ id, name, roundOrder, quarantine })), tasks }
}
