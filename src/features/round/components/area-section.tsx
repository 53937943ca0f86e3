import { ShieldAlert } from 'lucide-react'
import type { ReactNode } from 'react'
import type { AreaGroup } from '../utils/group-round'

/** One area of the round; quarantine is marked in words, not just colour, and comes last. */
export function AreaSection({ group, children }: { group: AreaGroup; children: ReactNode }) {
  const name = group.area?.name ?? 'Elsewhere'
  return (
    <section aria-label={name} className="flex flex-col gap-3">
      <h2 className="flex flex-wrap items-center gap-2 text-lg font-bold text-tide-900">
        {name}
        {group.area?.quarantine && (
          <span className="inline-flex items-center gap-1 rounded-md bg-ember-100 px-2 py-0.5 text-sm font-bold text-ember-700">
            <ShieldAlert aria-hidden className="size-4" /> Quarantine — walk it last
          </span>
        )}
      </h2>
      {children}
    </section>
  )
}
