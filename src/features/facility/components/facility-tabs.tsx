import { clsx } from 'clsx'
import { Boxes, Fish, ListTree, Network, Settings, Wrench, type LucideIcon } from 'lucide-react'
import { Link } from 'react-router-dom'

export const FACILITY_TABS = ['overview', 'tanks', 'systems', 'equipment', 'batches', 'settings'] as const
export type FacilityTab = (typeof FACILITY_TABS)[number]

const TABS: Record<FacilityTab, { label: string; icon: LucideIcon }> = {
  overview: { label: 'Overview', icon: ListTree },
  tanks: { label: 'Tanks', icon: Boxes },
  systems: { label: 'Systems', icon: Network },
  equipment: { label: 'Equipment', icon: Wrench },
  batches: { label: 'Batches', icon: Fish },
  settings: { label: 'Settings', icon: Settings },
}

export const parseFacilityTab = (value: string | null): FacilityTab =>
  FACILITY_TABS.find((t) => t === value) ?? 'overview'

/** Section links kept in the URL (?tab=), so a section can be bookmarked and the back button works. */
export function FacilityTabs({ current }: { current: FacilityTab }) {
  return (
    <nav aria-label="Tanks sections" className="-mx-4 overflow-x-auto px-4 md:mx-0 md:px-0">
      <ul className="flex min-w-max gap-1 border-b border-tide-200">
        {FACILITY_TABS.map((tab) => {
          const { label, icon: Icon } = TABS[tab]
          const active = tab === current
          return (
            <li key={tab}>
              <Link
                to={{ search: `?tab=${tab}` }}
                aria-current={active ? 'page' : undefined}
                preventScrollReset
                className={clsx(
                  '-mb-px flex min-h-11 items-center gap-2 border-b-[3px] px-3 font-semibold',
                  active ? 'border-tide-700 text-tide-900' : 'border-transparent text-tide-600 hover:text-tide-900',
                )}
              >
                <Icon aria-hidden className="size-4" /> {label}
              </Link>
            </li>
          )
        })}
      </ul>
    </nav>
  )
}
