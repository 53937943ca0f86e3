import { CircleX, OctagonAlert, TriangleAlert } from 'lucide-react'

const FLAGS = {
  watch: { label: 'Watch', icon: TriangleAlert, tone: 'text-ember-700' },
  critical: { label: 'Critical', icon: OctagonAlert, tone: 'text-alarm-700' },
  missed: { label: 'Missed', icon: CircleX, tone: 'text-alarm-700' },
} as const

/** A flag or a miss as icon + word; anything else as plain text. */
export function FlagText({ flag }: { flag: string }) {
  const f = FLAGS[flag as keyof typeof FLAGS]
  if (!f) return <>{flag || '—'}</>
  return (
    <span className={`inline-flex items-center gap-1 font-semibold ${f.tone}`}>
      <f.icon aria-hidden className="size-4" /> {f.label}
    </span>
  )
}
