import type { LucideIcon } from 'lucide-react'

/** What an Outbox list says before anything was sent on its channel. */
export function OutboxEmpty({ icon: Icon, children }: { icon: LucideIcon; children: string }) {
  return (
    <p className="flex items-center gap-2 rounded-xl border border-tide-200 bg-white p-4 text-tide-700">
      <Icon aria-hidden className="size-5 shrink-0" /> {children}
    </p>
  )
}
