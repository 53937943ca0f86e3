import type { Area, System, Tank } from '#shared/schemas/facility'

export function FacilityCounts({ areas, systems, tanks }: { areas: Area[]; systems: System[]; tanks: Tank[] }) {
  const inUse = tanks.filter((t) => t.inUse).length
  const items = [
    { label: 'Areas', value: areas.length },
    { label: 'Systems', value: systems.length },
    { label: 'Tanks in use', value: inUse },
    { label: 'Empty tanks', value: tanks.length - inUse },
  ]
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4">
      {items.map((item) => (
        <div key={item.label} className="rounded-xl border border-tide-200 bg-white px-4 py-3">
          <dt className="text-sm text-tide-700">{item.label}</dt>
          <dd className="text-2xl font-bold tabular-nums text-tide-900">{item.value}</dd>
        </div>
      ))}
    </dl>
  )
}
