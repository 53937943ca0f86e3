import type { EscalationRecord } from '#shared/schemas/ladder'
import { formatWhen } from '../../../lib/zone-format'
import { CHANNEL_LOOK } from './channel-picker'
import { DeliveryStatus } from './delivery-status'

type Notification = EscalationRecord['notifications'][number]

const tries = (n: number) => `${n} ${n === 1 ? 'attempt' : 'attempts'}`

/** Each message of an alert's ladder: the step, to whom, when it went, and whether it arrived. */
export function NotificationList({ notifications, timeZone }: { notifications: Notification[]; timeZone: string }) {
  if (notifications.length === 0) return <p className="text-sm text-tide-700">No messages sent yet.</p>
  return (
    <ol aria-label="Messages" className="flex flex-col divide-y divide-tide-100 rounded-lg border border-tide-100">
      {notifications.map((n, i) => {
        const Channel = CHANNEL_LOOK[n.channel].icon
        return (
          <li key={i} className="grid gap-1 px-3 py-2 sm:grid-cols-[5rem_minmax(0,1fr)_minmax(0,1.2fr)] sm:items-start sm:gap-3">
            <span className="text-sm font-semibold text-tide-600">Step {n.step + 1}</span>
            <span className="min-w-0">
              <span className="block font-semibold text-tide-900">{n.personName}</span>
              <span className="flex items-center gap-1 truncate text-sm text-tide-600">
                <Channel aria-hidden className="size-4 shrink-0" /> {CHANNEL_LOOK[n.channel].label} · {n.channel === 'push' ? 'installed app' : n.destination}
              </span>
            </span>
            <span className="flex flex-col gap-0.5">
              <DeliveryStatus status={n.status} />
              <span className="text-sm text-tide-700">
                {n.sentAt ? `Sent ${formatWhen(n.sentAt, timeZone)}` : 'Not sent'}
                {n.attempts > 0 && ` · ${tries(n.attempts)}`}
              </span>
              {n.providerStatus && <span className="text-sm text-tide-700">Provider: {n.providerStatus}</span>}
              {n.lastError && (
                <span className="text-sm break-words text-alarm-700">
                  Error: {n.lastError}
                  {n.status === 'failed' && ' · will retry'}
                </span>
              )}
            </span>
          </li>
        )
      })}
    </ol>
  )
}
