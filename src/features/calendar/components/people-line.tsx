import type { LucideIcon } from 'lucide-react'

interface Props {
  icon: LucideIcon
  label: string
  names: string[]
  /** How many names to show before "+N"; all when undefined. */
  limit?: number
}

/** "Priya Nandakumar" -> "Priya N." for narrow cells. */
const shortName = (name: string) => {
  const [first, ...rest] = name.trim().split(/\s+/)
  return rest.length ? `${first} ${rest[rest.length - 1][0]}.` : first
}

/**
 * Who is on shift or on call, sized to the cell: full names when there is room, short names
 * when narrow, only a number when very narrow. Full names always stay for screen readers.
 */
export function PeopleLine({ icon: Icon, label, names, limit }: Props) {
  if (names.length === 0) return null
  const shown = limit === undefined ? names : names.slice(0, limit)
  const more = names.length - shown.length
  const extra = more > 0 && <span className="font-semibold"> +{more}</span>
  return (
    <p className="flex items-start gap-1" title={`${label}: ${names.join(', ')}`}>
      <Icon aria-hidden className="mt-0.5 size-3.5 shrink-0" />
      <span aria-hidden className="hidden tabular-nums @max-[3.5rem]:inline">
        {names.length}
      </span>
      <span aria-hidden className="hidden min-w-0 @min-[3.5rem]:@max-[7.5rem]:inline">
        {shown.map(shortName).join(', ')}
        {extra}
      </span>
      <span className="min-w-0 @max-[7.5rem]:sr-only">
        <span className="sr-only">{label}: </span>
        {shown.join(', ')}
        {extra}
      </span>
    </p>
  )
}
