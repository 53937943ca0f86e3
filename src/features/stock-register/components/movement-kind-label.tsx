import { ArrowRightLeft, FlaskConical, HeartCrack, Layers, PackagePlus, PencilLine, Scissors, Truck, type LucideIcon } from 'lucide-react'
import { MOVEMENT_KIND_LABELS, type MovementKind } from '#shared/schemas/stock'

const ICONS: Record<MovementKind, LucideIcon> = {
  arrival: PackagePlus,
  transfer: ArrowRightLeft,
  grading: Layers,
  mortality: HeartCrack,
  cull: Scissors,
  sampling: FlaskConical,
  dispatch: Truck,
  correction: PencilLine,
}

/** A movement's kind as icon and words. */
export function MovementKindLabel({ kind }: { kind: MovementKind }) {
  const Icon = ICONS[kind]
  return (
    <span className="inline-flex items-center gap-1 font-semibold text-tide-900">
      <Icon aria-hidden className="size-4 shrink-0 text-tide-600" /> {MOVEMENT_KIND_LABELS[kind]}
    </span>
  )
}
