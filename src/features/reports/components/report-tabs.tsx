import { clsx } from 'clsx'
import { BellRing, ClipboardCheck, Fish, HeartPulse, type LucideIcon } from 'lucide-react'
import { Link, useSearchParams } from 'react-router-dom'

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
  return (
    <nav aria-label="Reports" className="-mx-4 overflow-x-auto px-4 md:mx-0 md:px-0 print:hidden">
      <ul className="flex min-w-max gap-1 border-b border-tide-200">
        {(Object.keys(VIEWS) as ReportView[]).map((view) => {
          const { label, icon: Icon } = VIEWS[view]
          const active = view === current
          return (
            <li key={view}>
              <Link
                to={to(view)}
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
