import { ListChecks } from 'lucide-react'
import { FASTING_KINDS, type Playbook } from '#shared/schemas/playbook'
import { previewEventTasks } from '../utils/event-preview'
import { fastingWindowFor } from '../utils/event-form'
import { formatWallTime } from '../utils/zone-format'
import { FastingWindow } from './fasting-window'

type Props = { playbook: Playbook; localStart: string; zone: string; tankCount: number; fastingHours: number }

/** What starting the event will put on the board, worked out the way the server plans it. */
export function EventTaskPreview({ playbook, localStart, zone, tankCount, fastingHours }: Props) {
  const { lines, total } = previewEventTasks(playbook.steps, localStart, zone, tankCount)
  const fasting = FASTING_KINDS.includes(playbook.kind) ? fastingWindowFor(localStart, zone, fastingHours) : null
  return (
    <section aria-labelledby="event-preview-heading" className="rounded-lg bg-tide-50 p-3 md:p-4">
      <h3 id="event-preview-heading" className="flex items-center gap-2 font-bold text-tide-900">
        <ListChecks aria-hidden className="size-5 text-tide-600" /> Tasks this event will create
      </h3>
      <p className="text-sm text-tide-700" data-testid="preview-total">
        {tankCount === 0
          ? 'Choose the tanks or a batch to see the tasks.'
          : `${total} ${total === 1 ? 'task' : 'tasks'} for ${tankCount} ${tankCount === 1 ? 'tank' : 'tanks'}, facility time (${zone}).`}
      </p>
      {fasting && (
        <div className="mt-2">
          <FastingWindow from={fasting.from} to={fasting.to} zone={zone} />
        </div>
      )}
      {tankCount > 0 && (
        <table className="mt-2 w-full text-left text-sm">
          <thead className="text-tide-700">
            <tr>
              <th className="py-1 pr-3 font-semibold">When</th>
              <th className="py-1 pr-3 font-semibold">Task</th>
              <th className="py-1 text-right font-semibold">Tasks</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-tide-100">
            {lines.map((l) => (
              <tr key={`${l.title}-${l.first}`}>
                <td className="py-1.5 pr-3 align-top tabular-nums text-tide-900">
                  {formatWallTime(l.first)}
                  {l.times > 1 && <span className="block text-tide-600">daily to {formatWallTime(l.last)}</span>}
                </td>
                <td className="py-1.5 pr-3 align-top text-tide-900">{l.title}</td>
                <td className="py-1.5 text-right align-top tabular-nums text-tide-900">{l.times * l.perOccurrence}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  )
}
