import { clsx } from 'clsx'
import { CircleAlert, CircleCheck, CircleHelp, TriangleAlert, type LucideIcon } from 'lucide-react'
import type { CylinderStatus } from '#shared/schemas/oxygen'

const LEVELS: Record<CylinderStatus['level'], { label: string; icon: LucideIcon; tone: string }> = {
  ok: { label: 'OK', icon: CircleCheck, tone: 'bg-kelp-50 text-kelp-700 ring-kelp-100' },
  low: { label: 'Low', icon: TriangleAlert, tone: 'bg-ember-50 text-ember-700 ring-ember-100' },
  critical: { label: 'Critical', icon: CircleAlert, tone: 'bg-alarm-50 text-alarm-700 ring-alarm-100' },
  unknown: { label: 'No reading yet', icon: CircleHelp, tone: 'bg-tide-50 text-tide-700 ring-tide-100' },
}

export function LevelLabel({ level }: { level: CylinderStatus['level'] }) {
  const l = LEVELS[level]
  return (
    <span className={clsx('inline-flex items-center gap-1 rounded-md px-2 py-0.5 text-sm font-bold ring-1', l.tone)}>
      <l.icon aria-hidden className="size-4" /> {l.label}
    </span>
  )
}
