import { Boxes, Fish, ListTree, Network, Settings, Wrench, type LucideIcon } from 'lucide-react'
import { LinkTabs } from '../../../components/ui/link-tabs'

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

export const parseFacilityTab = (value: string | null): FacilityTab => FACILITY_TABS.find((t) => t === value) ?? 'overview'

/** Section links kept in the URL (?tab=), so a section can be bookmarked and the back button works. */
export function FacilityTabs({ current }: { current: FacilityTab }) {
  const tabs = FACILITY_TABS.map((tab) => ({ key: tab, ...TABS[tab], to: { search: `?tab=${tab}` } }))
  return <LinkTabs label="Tanks sections" tabs={tabs} current={current} />
}
