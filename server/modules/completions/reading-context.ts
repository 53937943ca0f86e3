import { pickLimit } from '#shared/readings/band'
import type { ReadingRule } from '#shared/readings/judge-readings'
import { loadCatalogue } from '../facility/facility-catalogue'
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

/**
 * Where a task's readings were taken, and which rules judge them there: from the process's copies
 * of the catalogue, parameters and limits (record 16e), none read per completion.
 */
export async function readingContextFor(task: Pick<TaskRow, 'tankId' | 'targetKind' | 'targetId'>): Promise<ReadingContext> {
  const [cat, parameters, limits] = await Promise.all([
    // A tank or system the copy lacks was likely made by another process since it was loaded.
    loadCatalogue((c) => (!task.tankId || c.tanks.has(task.tankId)) && (task.targetKind !== 'system' || c.systems.has(task.targetId))),
    listParameters(),
    listLimits(),
  ])
  const tank = task.tankId ? (cat.tanks.get(task.tankId) ?? null) : null
  const systemId = task.targetKind === 'system' ? task.targetId : (tank?.systemId ?? null)
  const system = systemId ? (cat.systems.get(systemId) ?? null) : null
  const batchIds = [...cat.batches.values()]
    .filter(
      (b) =>
        (b.status === 'active' || b.status === 'quarantine') &&
        ((tank && b.tankIds.includes(tank.id)) || (task.targetKind === 'batch' && b.id === task.targetId)),
    )
    .map((b) => b.id)
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
