import { clsx } from 'clsx'
import { CircleHelp, CircleSlash, Clock, Layers, MailCheck, MailWarning, MailX, MoonStar, Send, type LucideIcon } from 'lucide-react'
import type { EscalationRecord } from '#shared/schemas/ladder'

type Status = EscalationRecord['notifications'][number]['status']

const LOOK: Record<Status, { label: string; icon: LucideIcon; tone: string }> = {
  pending: { label: 'Queued', icon: Clock, tone: 'text-tide-700' },
  sending: { label: 'Sending', icon: Send, tone: 'text-tide-700' },
  sent: { label: 'Sent', icon: MailCheck, tone: 'text-kelp-700' },
  failed: { label: 'Not delivered', icon: MailWarning, tone: 'text-alarm-700' },
  held: { label: 'Waiting for quiet hours to end', icon: MoonStar, tone: 'text-tide-700' },
  superseded: { label: 'Not needed (answered first)', icon: CircleSlash, tone: 'text-tide-600' },
  undelivered: { label: 'Not delivered; next channel tried', icon: MailX, tone: 'text-alarm-700' },
  suppressed: { label: 'Held back (text limit); in a summary', icon: Layers, tone: 'text-tide-700' },
  unknown: { label: 'Unknown (app stopped while sending); next channel tried', icon: CircleHelp, tone: 'text-alarm-700' },
}

export function DeliveryStatus({ status }: { status: Status }) {
  const look = LOOK[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 text-sm font-semibold', look.tone)}>
      <look.icon aria-hidden className="size-4 shrink-0" /> {look.label}
    </span>
  )
}
