import { pickLimit } from '#shared/readings/band'
import type { ReadingRule } from '#shared/readings/judge-readings'
import { batches, systems, tanks } from '../facility/catalogues'
import { listLimits, listParameters } from '../parameters/parameters.service'
import type { TaskRow } from '../tasks/task-writes.service'

export interface ReadingContext {
  tankId: number | null
  systemId: number | null
  batchIds: number[]
  salinitySetpoint: number | null
  /** The parameter and the limits that apply at this place, for `judgeReadings`. */
  ruleFor: (key: string) => ReadingRule | undefined
}

/** Where a task's readings were taken, and which rules judge them there. */
export async function readingContextFor(task: Pick<TaskRow, 'tankId' | 'targetKind' | 'targetId'>): Promise<ReadingContext> {
  const tank = task.tankId ? await tanks.get(task.tankId).catch(() => null) : null
  const systemId = task.targetKind === 'system' ? task.targetId : (tank?.systemId ?? null)
  const system = systemId ? await systems.get(systemId).catch(() => null) : null
  const batchIds = (await batches.list())
    .filter(
      (b) =>
        (b.status === 'active' || b.status === 'quarantine') &&
        ((tank && b.tankIds.includes(tank.id)) || (task.targetKind === 'batch' && b.id === task.targetId)),
    )
    .map((b) => b.id)
  const [parameters, limits] = await Promise.all([listParameters(), listLimits()])
  const byKey = new Map(parameters.map((p) => [p.key, p]))
  const where = { systemId, batchIds }
  const ruleFor = (key: string): ReadingRule | undefined => {
    const p = byKey.get(key)
    if (!p) return undefined
    const l = pickLimit(limits, key, where)
    return {
      name: p.name,
      unit: p.unit,
      physicalMin: p.physicalMin,
      physicalMax: p.physicalMax,
      derived: p.derived,
      okMin: l?.okMin ?? null,
      okMax: l?.okMax ?? null,
      criticalMin: l?.criticalMin ?? null,
      criticalMax: l?.criticalMax ?? null,
    }
  }
  return { tankId: tank?.id ?? null, systemId, batchIds, salinitySetpoint: system?.salinitySetpoint ?? null, ruleFor }
}
