import { BellRing, CircleCheck, CircleSlash, Clock } from 'lucide-react'
import { toast } from 'sonner'
import type { EscalationRecord } from '#shared/schemas/ladder'
import { Button } from '../../../components/ui/button'
import { useAcknowledge } from '../api/use-acknowledge'
import { formatWhen } from '../../../lib/zone-format'
import { NotificationList } from './notification-list'

const KIND_TEXT: Record<string, string> = { missed_task: 'Missed task', critical_reading: 'Critical reading' }

function Answer({ alert, timeZone }: { alert: EscalationRecord; timeZone: string }) {
  if (alert.acknowledgedAt) {
    return (
      <p className="flex items-center gap-2 font-semibold text-kelp-700">
        <CircleCheck aria-hidden className="size-5 shrink-0" />
        Acknowledged by {alert.acknowledgedByName ?? 'someone'} at {formatWhen(alert.acknowledgedAt, timeZone)}
      </p>
    )
  }
  if (alert.closedAt) {
    return (
      <p className="flex items-center gap-2 font-semibold text-tide-700">
        <CircleSlash aria-hidden className="size-5 shrink-0" /> Closed at {formatWhen(alert.closedAt, timeZone)}: the task was answered
      </p>
    )
  }
  return (
    <p className="flex items-center gap-2 font-semibold text-alarm-700">
      <Clock aria-hidden className="size-5 shrink-0" /> Waiting for an answer
    </p>
  )
}

/** One alert on the task: what started it, which ladder it climbs, who answered, and its messages. */
export function AlertRecord({
  alert,
  taskId,
  timeZone,
  canAcknowledge,
}: {
  alert: EscalationRecord
  taskId: number
  timeZone: string
  canAcknowledge: boolean
}) {
  const acknowledge = useAcknowledge(taskId)
  const open = !alert.acknowledgedAt && !alert.closedAt
  return (
    <article aria-label={`${KIND_TEXT[alert.kind] ?? alert.kind} escalation`} className="flex flex-col gap-3 rounded-xl border border-tide-200 bg-white p-4">
      <header className="flex flex-col gap-1">
        <h3 className="flex items-center gap-2 text-lg font-bold text-tide-900">
          <BellRing aria-hidden className="size-5 text-alarm-600" /> {KIND_TEXT[alert.kind] ?? alert.kind}
        </h3>
        <p className="text-sm text-tide-700">
          {alert.detail} · started {formatWhen(alert.startedAt, timeZone)}
          {alert.ladderName && ` · ladder: ${alert.ladderName}`}
        </p>
      </header>
      <div className="flex flex-wrap items-center gap-3">
        <Answer alert={alert} timeZone={timeZone} />
        {open && canAcknowledge && (
          <Button
            type="button"
            disabled={acknowledge.isPending}
            onClick={() => acknowledge.mutate(alert.alertId, { onSuccess: () => toast.success('Acknowledged; no further messages will go out.') })}
          >
            Acknowledge
          </Button>
        )}
      </div>
      <NotificationList notifications={alert.notifications} timeZone={timeZone} />
    </article>
  )
}
