import { CircleAlert, CloudUpload } from 'lucide-react'
import type { Round } from '#shared/schemas/round'
import { retryEntry } from '../outbox/outbox-sender'
import { removeFromOutbox, type OutboxEntry } from '../outbox/outbox-store'
import { useDraftActions } from '../state/drafts'
import { draftErrorsFrom } from '../utils/build-completion'
import { doneAt } from '../utils/format'

/** A completion kept on the phone: waiting to send, or refused by the server and kept until dismissed. */
export function OutboxNotice({ entry, round }: { entry: OutboxEntry; round: Round }) {
  const { update } = useDraftActions()
  const failure = entry.failure
  if (!failure) {
    return (
      <p role="status" className="flex items-center gap-2 rounded-xl bg-tide-100 px-3 py-2 font-semibold text-tide-800">
        <CloudUpload aria-hidden className="size-5 shrink-0" /> Waiting to send — saved on this phone
      </p>
    )
  }
  const message =
    failure.completedByName && failure.completedAt
      ? `${failure.completedByName} already finished this task at ${doneAt(failure.completedAt, round.timeZone, round.date)}. Your entry was not saved.`
      : failure.message
  // Dismissing puts what was typed back in the form, so it can be corrected and sent again.
  const dismiss = async () => {
    const { input } = entry
    update(entry.taskId, {
      readings: Object.fromEntries(Object.entries(input.readings ?? {}).map(([k, v]) => [k, String(v)])),
      note: input.note ?? '',
      noteOpen: Boolean(input.note) && input.outcome !== 'skipped',
      mode: input.outcome === 'skipped' ? 'skip' : 'done',
      skipReason: input.skipReason ?? null,
      errors: failure.status === 400 ? draftErrorsFrom(failure.fieldErrors, failure.message) : {},
    })
    await removeFromOutbox(entry.completionId)
  }
  return (
    <div role="alert" className="flex flex-col gap-2 rounded-xl border border-alarm-100 bg-alarm-50 p-3 text-alarm-700">
      <p className="flex items-start gap-2 font-semibold">
        <CircleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
        <span>Not sent: {message}</span>
      </p>
      <div className="flex flex-wrap gap-2">
        {failure.status >= 500 && (
          <button
            type="button"
            onClick={() => void retryEntry(entry.completionId)}
            className="min-h-12 rounded-xl bg-white px-4 font-semibold text-tide-800 ring-1 ring-tide-200"
          >
            Try again
          </button>
        )}
        <button type="button" onClick={() => void dismiss()} className="min-h-12 rounded-xl bg-white px-4 font-semibold text-alarm-700 ring-1 ring-alarm-100">
          Dismiss
        </button>
      </div>
    </div>
  )
}
