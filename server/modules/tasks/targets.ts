import type { Tank } from '#shared/schemas/facility'
import type { Routine, TargetKind } from '#shared/schemas/routine'
import type { Catalogue } from '../facility/facility-catalogue'

// The catalogue is the facility module's; planners here and elsewhere read it through this file too.
export { loadCatalogue, type Catalogue } from '../facility/facility-catalogue'

export interface Target {
  kind: Exclude<TargetKind, 'area_tanks'>
  /** 0 for the facility itself. */
  id: number
  tankId: number | null
  areaId: number | null
  label: string
}

const tankTarget = (t: Tank): Target => ({ kind: 'tank', id: t.id, tankId: t.id, areaId: t.areaId, label: `${t.code} · ${t.name}` })

/** Expands a routine's targets into concrete ones: "every tank in area X" becomes those tanks. */
export function resolveTargets(routine: Pick<Routine, 'targetKind' | 'targetIds' | 'onlyInUse'>, cat: Catalogue): Target[] {
  const usable = (t: Tank | undefined): t is Tank => !!t && (!routine.onlyInUse || t.inUse)
  switch (routine.targetKind) {
    case 'facility':
      return [{ kind: 'facility', id: 0, tankId: null, areaId: null, label: cat.facility.name }]
    case 'tank':
      return routine.targetIds
        .map((id) => cat.tanks.get(id))
        .filter(usable)
        .map(tankTarget)
    case 'area_tanks': {
      const wanted = new Set(routine.targetIds)
      return [...cat.tanks.values()]
        .filter((t) => wanted.has(t.areaId) && usable(t))
        .sort((a, b) => a.code.localeCompare(b.code))
        .map(tankTarget)
    }
    case 'area':
      return routine.targetIds.flatMap((id) => {
        const a = cat.areas.get(id)
        return a ? [{ kind: 'area' as const, id, tankId: null, areaId: id, label: a.name }] : []
      })
    case 'system':
      return routine.targetIds.flatMap((id) => {
        const s = cat.systems.get(id)
        return s ? [{ kind: 'system' as const, id, tankId: null, areaId: s.areaId, label: s.name }] : []
      })
    case 'equipment':
      return routine.targetIds.flatMap((id) => {
        const e = cat.equipment.get(id)
        return e ? [{ kind: 'equipment' as const, id, tankId: null, areaId: e.areaId, label: `${e.code} · ${e.name}` }] : []
      })
    case 'batch':
      return routine.targetIds.flatMap((id) => {
        const b = cat.batches.get(id)
        if (!b || b.status === 'ended' || b.status === 'dispatched') return []
        const firstTank = cat.tanks.get(b.tankIds[0] ?? -1)
        return [{ kind: 'batch' as const, id, tankId: firstTank?.id ?? null, areaId: firstTank?.areaId ?? null, label: `Batch ${b.code}` }]
      })
  }
}

/** The label of a stored task's target, for lists and cards. */
export function targetLabel(kind: TargetKind, id: number, cat: Catalogue): string {
  if (kind === 'facility' || id === 0) return cat.facility.name
  if (kind === 'tank' || kind === 'area_tanks') {
    const t = cat.tanks.get(id)
    return t ? `${t.code} · ${t.name}` : `Tank #${id}`
  }
  const [target] = resolveTargets({ targetKind: kind, targetIds: [id], onlyInUse: false }, cat)
  return target?.label ?? `${kind} #${id}`
}
