import { Layers } from 'lucide-react'
import type { Area, Equipment, System, Tank } from '#shared/schemas/facility'
import { AreaBranch } from './area-branch'
import { TankTile } from './tank-tile'

interface FacilityTreeProps {
  areas: Area[]
  systems: System[]
  tanks: Tank[]
  equipment: Equipment[]
  canEdit: boolean
  onEditArea: (area: Area) => void
}

/** Areas in walking order, each with its systems and tanks; the shape a round follows. */
export function FacilityTree({ areas, systems, tanks, equipment, canEdit, onEditArea }: FacilityTreeProps) {
  const ordered = [...areas].sort((a, b) => a.roundOrder - b.roundOrder || a.code.localeCompare(b.code))
  const areaIds = new Set(areas.map((a) => a.id))
  const lost = tanks.filter((t) => !areaIds.has(t.areaId))

  if (areas.length === 0) {
    return (
      <div className="flex gap-3 rounded-xl border border-dashed border-tide-300 bg-white p-5">
        <Layers aria-hidden className="size-6 shrink-0 text-tide-500" />
        <div>
          <p className="font-semibold text-tide-900">No areas yet</p>
          <p className="mt-1 text-tide-700">
            Start with the areas in the order a round walks them: clean areas first, quarantine last. Systems and tanks go into areas.
          </p>
        </div>
      </div>
    )
  }

  return (
    <div className="flex flex-col gap-4">
      <ol aria-label="Areas in round order" className="flex flex-col gap-4">
        {ordered.map((area, i) => (
          <AreaBranch key={area.id} area={area} position={i + 1} systems={systems} tanks={tanks} equipment={equipment} canEdit={canEdit} onEdit={onEditArea} />
        ))}
      </ol>
      {lost.length > 0 && (
        <section aria-label="Tanks without an area" className="rounded-xl border border-ember-100 bg-ember-50 p-4">
          <h3 className="font-bold text-ember-700">Tanks without an area ({lost.length})</h3>
          <p className="text-sm text-ember-700">Their area was deleted. Edit each tank on the Tanks tab and choose an area.</p>
          <ul className="mt-2 grid grid-cols-[repeat(auto-fill,minmax(9.5rem,1fr))] gap-2">
            {lost.map((t) => (
              <TankTile key={t.id} tank={t} />
            ))}
          </ul>
        </section>
      )}
    </div>
  )
}
