import type { Area, Tank } from '#shared/schemas/facility'
import { TankLabel } from './tank-label'

/** Labels two to a row on A4, ready to cut along the dashed lines. */
export function LabelSheet({ tanks, areas }: { tanks: Tank[]; areas: Area[] }) {
  if (tanks.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No tanks to label here.</p>
  return (
    <ul aria-label="Labels" className="grid gap-3 md:grid-cols-2 print:grid-cols-2 print:gap-0">
      {tanks.map((t) => (
        <TankLabel key={t.id} tank={t} area={areas.find((a) => a.id === t.areaId)} />
      ))}
    </ul>
  )
}
