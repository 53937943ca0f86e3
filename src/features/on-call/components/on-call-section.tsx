import type { LucideIcon } from 'lucide-react'
import { useId, type ReactNode } from 'react'

/** One block of the on-call page: a heading with its icon, an optional count, then the content. */
export function OnCallSection({ title, icon: Icon, count, children }: { title: string; icon: LucideIcon; count?: number; children: ReactNode }) {
  const id = useId()
  return (
    <section aria-labelledby={id} className="rounded-xl border border-tide-200 bg-white p-4">
      <h2 id={id} className="flex items-center gap-2 text-lg font-bold text-tide-900">
        <Icon aria-hidden className="size-5 text-tide-600" /> {title}
        {count !== undefined && <span className="rounded-full bg-tide-100 px-2 text-sm text-tide-800">{count}</span>}
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  )
}
