import { clsx } from 'clsx'
import type { LucideIcon } from 'lucide-react'
import { Link, type To } from 'react-router-dom'

export interface LinkTab {
  key: string
  label: string
  icon: LucideIcon
  to: To
}

/** Sections as links in the address, so a section can be bookmarked, printed again and the back button works. */
export function LinkTabs({ label, tabs, current, className }: { label: string; tabs: ReadonlyArray<LinkTab>; current: string; className?: string }) {
  return (
    <nav aria-label={label} className={clsx('-mx-4 overflow-x-auto px-4 md:mx-0 md:px-0', className)}>
      <ul className="flex min-w-max gap-1 border-b border-tide-200">
        {tabs.map(({ key, label: text, icon: Icon, to }) => {
          const active = key === current
          return (
            <li key={key}>
              <Link
                to={to}
                aria-current={active ? 'page' : undefined}
                preventScrollReset
                className={clsx(
                  '-mb-px flex min-h-11 items-center gap-2 border-b-[3px] px-3 font-semibold',
                  active ? 'border-tide-700 text-tide-900' : 'border-transparent text-tide-600 hover:text-tide-900',
                )}
              >
                <Icon aria-hidden className="size-4" /> {text}
              </Link>
            </li>
          )
        })}
      </ul>
    </nav>
  )
}
