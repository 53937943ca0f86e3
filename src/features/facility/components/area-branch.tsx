import { Network } from 'lucide-react'
import type { Area, Equipment, System, Tank } from '#shared/schemas/facility'
import { formatLitres } from '../utils/format'
import { QuarantineFlag } from './quarantine-flag'
import { RowActions } from './row-actions'
import { TankTile } from './tank-tile'

interface AreaBranchProps {
  area: Area
  position: number
  systems: System[]
  tanks: Tank[]
  equipment: Equipment[]
  canEdit: boolean
  onEdit: (area: Area) => void
}

export function AreaBranch({ area, position, systems, tanks, equipment, canEdit, onEdit }: AreaBranchProps) {
  const here = tanks.filter((t) => t.areaId === area.id).sort((a, b) => a.code.localeCompare(b.code))
  const systemIds = new Set([...systems.filter((s) => s.areaId === area.id).map((s) => s.id), ...here.flatMap((t) => (t.systemId == null ? [] : [t.systemId]))])
  const groups = [
    ...systems
      .filter((s) => systemIds.has(s.id))
      .map((s) => ({ key: `s${s.id}`, system: s as System | undefined, tanks: here.filter((t) => t.systemId === s.id) })),
    { key: 'standalone', system: undefined, tanks: here.filter((t) => t.systemId == null || !systems.some((s) => s.id === t.systemId)) },
  ].filter((g) => g.system || g.tanks.length)
  const inUse = here.filter((t) => t.inUse).length
  const ownSystems = systems.filter((s) => s.areaId === area.id).length
  const ownEquipment = equipment.filter((e) => e.areaId === area.id).length
  const holdings = [
    [here.length, 'tank', 'tanks'],
    [ownSystems, 'system', 'systems'],
    [ownEquipment, 'piece of equipment', 'pieces of equipment'],
  ] as const
  const held = holdings.filter(([n]) => n > 0).map(([n, one, many]) => `${n} ${n === 1 ? one : many}`)
  const blocked = held.length ? `This area still holds ${held.join(' and ')}. Move or delete them first.` : undefined

  return (
    <li className="overflow-hidden rounded-xl border border-tide-200 bg-white">
      <div className="flex items-start justify-between gap-2 border-b border-tide-100 bg-tide-50 px-4 py-2">
        <div className="flex min-h-11 flex-wrap items-center gap-x-3 gap-y-1">
          <span aria-hidden className="grid size-8 shrink-0 place-items-center rounded-full bg-tide-800 text-sm font-bold text-white">
            {position}
          </span>
          <h3 className="font-bold text-tide-900">
            <span className="sr-only">Round stop {position}: </span>
            {area.name} <span className="font-normal text-tide-600">({area.code})</span>
          </h3>
          {area.quarantine && <QuarantineFlag />}
          <span className="text-sm text-tide-700">
            {here.length} {here.length === 1 ? 'tank' : 'tanks'} · {inUse} in use
          </span>
        </div>
        {canEdit && <RowActions name="areas" id={area.id} label={`area ${area.code}`} onEdit={() => onEdit(area)} blockedReason={blocked} />}
      </div>
      <div className="flex flex-col gap-4 p-4">
        {groups.length === 0 && <p className="text-sm text-tide-600">No systems or tanks in this area yet.</p>}
        {groups.map((g) => (
          <div key={g.key}>
            <h4 className="flex flex-wrap items-center gap-x-2 text-sm font-semibold text-tide-800">
              <Network aria-hidden className="size-4" />
              {g.system ? (
                <>
                  System {g.system.name} ({g.system.code})<span className="font-normal text-tide-600">{formatLitres(g.system.volumeL)} loop</span>
                </>
              ) : (
                'Standalone tanks'
              )}
            </h4>
            {g.tanks.length ? (
              <ul className="mt-2 grid grid-cols-[repeat(auto-fill,minmax(9.5rem,1fr))] gap-2">
                {g.tanks.map((t) => (
                  <TankTile key={t.id} tank={t} />
                ))}
              </ul>
            ) : (
              <p className="mt-1 text-sm text-tide-600">No tanks on this system in this area.</p>
            )}
          </div>
        ))}
      </div>
    </li>
  )
}
