import type { LucideIcon } from 'lucide-react'

interface Props {
  icon: LucideIcon
  label: string
  names: string[]
  /** How many names to show before "+N"; all when undefined. */
  limit?: number
}

/** "On shift: Priya, Tom +2" in a day cell; the full list goes to the tooltip. */
export function PeopleLine({ icon: Icon, label, names, limit }: Props) {
  if (names.length === 0) return null
  const shown = limit === undefined ? names : names.slice(0, limit)
  const more = names.length - shown.length
  return (
    <p className="flex items-start gap-1" title={`${label}: ${names.join(', ')}`}>
      <Icon aria-hidden className="mt-0.5 size-3.5 shrink-0" />
      <span className="min-w-0">
        <span className="sr-only">{label}: </span>
        {shown.join(', ')}
        {more > 0 && <span className="font-semibold"> +{more}</span>}
      </span>
    </p>
  )
}
