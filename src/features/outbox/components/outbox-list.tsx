import { clsx } from 'clsx'
import { Inbox, Mail } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { OutboxMessage } from '#shared/schemas/ladder'
import { formatWhen } from '../../../lib/zone-format'
import { OutboxEmpty } from './outbox-empty'

/** The mail the app sent, newest first; choosing one puts its id in the address. */
export function OutboxList({ messages, selectedId, timeZone }: { messages: OutboxMessage[]; selectedId: number | null; timeZone: string }) {
  if (messages.length === 0) return <OutboxEmpty icon={Inbox}>No mail has been sent yet.</OutboxEmpty>
  const sorted = [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id - a.id)
  return (
    <ul aria-label="Messages" className="divide-y divide-tide-100 overflow-hidden rounded-xl border border-tide-200 bg-white">
      {sorted.map((m) => (
        <li key={m.id}>
          <Link
            to={`?id=${m.id}`}
            aria-current={m.id === selectedId ? 'true' : undefined}
            className={clsx('flex min-h-11 gap-3 px-4 py-3', m.id === selectedId ? 'bg-tide-100' : 'hover:bg-tide-50')}
          >
            <Mail aria-hidden className="mt-0.5 size-5 shrink-0 text-tide-500" />
            <span className="min-w-0 flex-1">
              <span className="block font-semibold break-words text-tide-900">{m.subject}</span>
              <span className="block truncate text-sm text-tide-600">To {m.to}</span>
              <span className="block text-sm text-tide-600">{formatWhen(m.receivedAt, timeZone)}</span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  )
}
