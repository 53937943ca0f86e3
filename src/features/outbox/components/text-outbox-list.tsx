import { MessageSquareReply, MessageSquareText, Reply } from 'lucide-react'
import { toast } from 'sonner'
import type { TextOutboxMessage } from '#shared/schemas/ladder'
import { Button } from '../../../components/ui/button'
import { formatWhen } from '../../../lib/zone-format'
import { useReplyToText } from '../api/use-reply-to-text'
import { OutboxEmpty } from './outbox-empty'

const replyCode = (body: string) => /Reply (\d{4}) to acknowledge/.exec(body)?.[1] ?? null

/** Texts the local provider received (and replies it delivered), newest first; a sent alert can be answered as its recipient would. */
export function TextOutboxList({ texts, timeZone }: { texts: TextOutboxMessage[]; timeZone: string }) {
  const reply = useReplyToText()
  if (texts.length === 0) return <OutboxEmpty icon={MessageSquareText}>No text messages have been sent yet.</OutboxEmpty>
  return (
    <ul aria-label="Text messages" className="divide-y divide-tide-100 overflow-hidden rounded-xl border border-tide-200 bg-white">
      {texts.map((t) => {
        const code = t.direction === 'outbound' ? replyCode(t.body) : null
        const Icon = t.direction === 'inbound' ? MessageSquareReply : MessageSquareText
        return (
          <li key={t.id} className="flex gap-3 px-4 py-3">
            <Icon aria-hidden className="mt-0.5 size-5 shrink-0 text-tide-500" />
            <span className="flex min-w-0 flex-1 flex-col gap-1">
              <span className="text-sm font-semibold text-tide-700">
                {t.direction === 'inbound' ? `Reply from ${t.from}` : `To ${t.to}`} · {formatWhen(t.receivedAt, timeZone)} · {t.status}
              </span>
              <span className="break-words text-tide-900">{t.body}</span>
              {code && (
                <Button
                  type="button"
                  variant="secondary"
                  className="self-start"
                  disabled={reply.isPending}
                  onClick={() =>
                    reply.mutate(
                      { id: t.id, body: code },
                      { onSuccess: ({ answer }) => toast.success(`Replied ${code}. Roundtide answered: ${answer}`), onError: (e) => toast.error(e.message) },
                    )
                  }
                >
                  <Reply aria-hidden className="size-5" /> Reply {code} as the recipient
                </Button>
              )}
            </span>
          </li>
        )
      })}
    </ul>
  )
}
