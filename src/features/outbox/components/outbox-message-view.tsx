import { ArrowLeft, ExternalLink, SquareCheckBig } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { OutboxMessage } from '#shared/schemas/ladder'
import { messageLinks } from '../utils/message-links'
import { formatWhen } from '../../../lib/zone-format'

const linkButton = 'inline-flex min-h-11 items-center gap-2 rounded-lg px-4 font-semibold'

/** One message: its links pulled out, the text part, and the HTML part in a sandbox that runs nothing. */
export function OutboxMessageView({ message, timeZone }: { message: OutboxMessage; timeZone: string }) {
  const { ack, taskPath } = messageLinks(message.text)
  return (
    <article aria-label={message.subject} className="flex min-w-0 flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4">
      <Link to="." className="inline-flex min-h-11 items-center gap-1 self-start font-semibold text-tide-700 md:hidden">
        <ArrowLeft aria-hidden className="size-4" /> All messages
      </Link>
      <header>
        <h2 className="text-lg font-bold break-words text-tide-900">{message.subject}</h2>
        <p className="text-sm text-tide-700">
          To {message.to} · {formatWhen(message.receivedAt, timeZone)}
        </p>
      </header>
      {(ack || taskPath) && (
        <div className="flex flex-wrap gap-2">
          {ack && (
            <a href={ack} className={`${linkButton} bg-tide-700 text-white hover:bg-tide-800`}>
              <SquareCheckBig aria-hidden className="size-5" /> Open acknowledge link
            </a>
          )}
          {taskPath && (
            <Link to={taskPath} className={`${linkButton} ring-1 ring-tide-200 text-tide-800 hover:bg-tide-50`}>
              <ExternalLink aria-hidden className="size-5" /> Open the task
            </Link>
          )}
        </div>
      )}
      <section aria-label="Text part">
        <h3 className="mb-1 text-sm font-semibold tracking-wide text-tide-600 uppercase">Text part</h3>
        <pre className="overflow-x-auto rounded-lg bg-tide-50 p-3 font-mono text-sm whitespace-pre-wrap break-words text-tide-900">
          {message.text || '(empty)'}
        </pre>
      </section>
      <section aria-label="HTML part">
        <h3 className="mb-1 text-sm font-semibold tracking-wide text-tide-600 uppercase">HTML part</h3>
        {message.html ? (
          // sandbox="" : no scripts, forms, popups or same-origin access for whatever the mail contains.
          <iframe
            title={`HTML part of ${message.subject}`}
            sandbox=""
            srcDoc={message.html}
            className="h-72 w-full rounded-lg border border-tide-200 bg-white"
          />
        ) : (
          <p className="text-sm text-tide-700">This message has no HTML part.</p>
        )}
      </section>
    </article>
  )
}
