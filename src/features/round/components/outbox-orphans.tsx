import type { Round } from '#shared/schemas/round'
import type { OutboxEntry } from '../outbox/outbox-store'
import { OutboxNotice } from './outbox-notice'

/** Queued completions whose task is no longer on this round (moved or reassigned): still shown, never dropped. */
export function OutboxOrphans({ entries, round }: { entries: OutboxEntry[]; round: Round }) {
  const orphans = entries.filter((e) => !round.tasks.some((t) => t.id === e.taskId))
  if (!orphans.length) return null
  return (
    <section aria-label="Not on this round" className="mb-6 flex flex-col gap-2">
      <h2 className="text-lg font-bold text-tide-900">Saved on this phone, not on this round</h2>
      {orphans.map((entry) => (
        <div key={entry.completionId} className="flex flex-col gap-2 rounded-2xl bg-white p-3 ring-1 ring-tide-200">
          <p className="font-semibold text-tide-900">
            {entry.taskTitle} · {entry.targetLabel}
          </p>
          <OutboxNotice entry={entry} round={round} />
        </div>
      ))}
    </section>
  )
}
