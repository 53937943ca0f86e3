import { useQuery } from '@tanstack/react-query'
import type { TargetKind } from '#shared/schemas/routine'
import { catalogueQueries as refs } from '../../../api/catalogues'

export type TargetOption = { id: number; label: string; note?: string; group?: string }

const byCode = <T extends { code: string }>(a: T, b: T) => a.code.localeCompare(b.code)

/** The choices for one kind of target, loading only the catalogues that kind needs. */
export function useTargetOptions(kind: TargetKind) {
  const areas = useQuery({ ...refs.areas(), enabled: kind === 'area' || kind === 'area_tanks' || kind === 'tank' })
  const tanks = useQuery({ ...refs.tanks(), enabled: kind === 'tank' || kind === 'area_tanks' })
  const systems = useQuery({ ...refs.systems(), enabled: kind === 'system' })
  const equipment = useQuery({ ...refs.equipment(), enabled: kind === 'equipment' })
  const batches = useQuery({ ...refs.batches(), enabled: kind === 'batch' })

  const needed = {
    facility: [],
    area: [areas],
    area_tanks: [areas, tanks],
    tank: [areas, tanks],
    system: [systems],
    equipment: [equipment],
    batch: [batches],
  }[kind]
  const failed = needed.find((q) => q.isError)
  const status = failed ? 'error' : needed.some((q) => q.isPending) ? 'pending' : 'success'
  const retry = () => needed.forEach((q) => void q.refetch())

  let options: TargetOption[] = []
  if (status === 'success') {
    const areaList = areas.data ?? []
    const tankList = tanks.data ?? []
    const areaName = new Map(areaList.map((a) => [a.id, a.name]))
    switch (kind) {
      case 'tank':
        options = [...tankList]
          .sort((a, b) => areaList.findIndex((x) => x.id === a.areaId) - areaList.findIndex((x) => x.id === b.areaId) || byCode(a, b))
          .map((t) => ({ id: t.id, label: `${t.code} · ${t.name}`, note: t.inUse ? undefined : 'not in use', group: areaName.get(t.areaId) ?? 'No area' }))
        break
      case 'area':
      case 'area_tanks':
        options = areaList.map((a) => {
          const inArea = tankList.filter((t) => t.areaId === a.id)
          const note =
            kind === 'area_tanks' ? `${inArea.filter((t) => t.inUse).length} of ${inArea.length} tanks in use` : a.quarantine ? 'quarantine' : undefined
          return { id: a.id, label: `${a.code} · ${a.name}`, note }
        })
        break
      case 'system':
        options = [...(systems.data ?? [])].sort(byCode).map((s) => ({ id: s.id, label: `${s.code} · ${s.name}` }))
        break
      case 'equipment':
        options = [...(equipment.data ?? [])].sort(byCode).map((e) => ({ id: e.id, label: `${e.code} · ${e.name}`, note: e.kind }))
        break
      case 'batch':
        options = (batches.data ?? []).map((b) => ({ id: b.id, label: `${b.code} · ${b.species}`, note: b.status }))
        break
    }
  }
  return { status, options, error: failed?.error ?? null, retry } as const
}
