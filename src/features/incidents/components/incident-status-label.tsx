import { clsx } from 'clsx'
import { Ban, CircleCheck, CircleDashed, CircleQuestionMark, Send, type LucideIcon } from 'lucide-react'
import type { Incident } from '#shared/schemas/incident'

export const INCIDENT_STATUS_LOOK: Record<Incident['status'], { label: string; icon: LucideIcon; tone: string }> = {
  proposed: { label: 'Proposed: needs a decision', icon: CircleQuestionMark, tone: 'text-ember-700' },
  open: { label: 'Open', icon: CircleDashed, tone: 'text-tide-800' },
  reported: { label: 'Reported', icon: Send, tone: 'text-tide-700' },
  closed: { label: 'Closed', icon: CircleCheck, tone: 'text-kelp-700' },
  dismissed: { label: 'Dismissed', icon: Ban, tone: 'text-tide-600' },
}

/** An incident's status as icon and words. */
export function IncidentStatusLabel({ status }: { status: Incident['status'] }) {
  const s = INCIDENT_STATUS_LOOK[status]
  return (
    <span className={clsx('inline-flex shrink-0 items-center gap-1 text-sm font-semibold', s.tone)}>
      <s.icon aria-hidden className="size-4" /> {s.label}
    </span>
  )
}
