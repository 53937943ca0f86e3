import { BellRing, ClipboardCheck, Fish, HeartPulse, type LucideIcon } from 'lucide-react'
import { useSearchParams } from 'react-router-dom'
import { LinkTabs } from '../../../components/ui/link-tabs'

export const REPORT_VIEWS = ['compliance', 'responses', 'welfare', 'animals'] as const
export type ReportView = (typeof REPORT_VIEWS)[number]

const VIEWS: Record<ReportView, { label: string; icon: LucideIcon }> = {
  compliance: { label: 'Compliance', icon: ClipboardCheck },
  responses: { label: 'Response times', icon: BellRing },
  welfare: { label: 'Welfare checks', icon: HeartPulse },
  animals: { label: 'Animal record', icon: Fish },
}

export const parseReportView = (value: string | null): ReportView => REPORT_VIEWS.find((v) => v === value) ?? 'compliance'

/** One report at a time, kept in the address (?view=) with the range, so Print and the back button follow it. */
export function ReportTabs({ current }: { current: ReportView }) {
  const [params] = useSearchParams()
  const to = (view: ReportView) => {
    const next = new URLSearchParams(params)
    next.set('view', view)
    return { search: `?${next}` }
  }
  const tabs = REPORT_VIEWS.map((view) => ({ key: view, ...VIEWS[view], to: to(view) }))
  return <LinkTabs label="Reports" tabs={tabs} current={current} className="print:hidden" />
}
