import { BellOff, BellRing } from 'lucide-react'
import type { PushOutboxMessage } from '#shared/schemas/ladder'
import { formatWhen } from '../../../lib/zone-format'
import { OutboxEmpty } from './outbox-empty'

/** Push messages as the local push service decrypted them, newest first; a refused one says why. */
export function PushOutboxList({ pushes, timeZone }: { pushes: PushOutboxMessage[]; timeZone: string }) {
  if (pushes.length === 0) return <OutboxEmpty icon={BellRing}>No push notifications have been sent yet.</OutboxEmpty>
  return (
    <ul aria-label="Push notifications" className="divide-y divide-tide-100 overflow-hidden rounded-xl border border-tide-200 bg-white">
      {pushes.map((p) => {
        const refused = p.status === 'refused'
        const Icon = refused ? BellOff : BellRing
        return (
          <li key={p.id} className="flex gap-3 px-4 py-3">
            <Icon aria-hidden className={refused ? 'mt-0.5 size-5 shrink-0 text-alarm-700' : 'mt-0.5 size-5 shrink-0 text-kelp-700'} />
            <span className="flex min-w-0 flex-1 flex-col gap-1">
              <span className="text-sm font-semibold text-tide-700">
                {refused ? 'Refused' : 'Decrypted'} · To {p.personName ?? 'a device no longer registered'} · {formatWhen(p.receivedAt, timeZone)}
              </span>
              {refused ? (
                <span className="break-words text-alarm-700">{p.note}</span>
              ) : (
                <span className="break-words font-semibold text-tide-900">{p.title}</span>
              )}
              {p.body && <span className="break-words text-tide-800">{p.body}</span>}
            </span>
          </li>
        )
      })}
    </ul>
  )
}
