import { ClipboardList } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { Batch, Tank } from '#shared/schemas/facility'
import type { FacilityEvent, Playbook } from '#shared/schemas/playbook'
import { EVENT_KIND_LABELS } from '../utils/kind-labels'
import { tankCodes } from '../utils/tank-text'
import { formatWallTime } from '../utils/zone-format'
import { EventActions } from './event-actions'
import { EventStatusLabel } from './event-status-label'
import { FastingWindow } from './fasting-window'

type Props = { event: FacilityEvent; playbook: Playbook; tanks: Tank[]; batches: Batch[]; zone: string; canManage: boolean }

/** The batches whose record this event adds to: its own, or those living in its tanks. */
const recordBatches = (event: FacilityEvent, batches: Batch[]) =>
  event.batchId !== null
    ? batches.filter((b) => b.id === event.batchId)
    : batches.filter((b) => (b.status === 'quarantine' || b.status === 'active') && b.tankIds.some((id) => event.tankIds.includes(id)))

export function EventSummary({ event, playbook, tanks, batches, zone, canManage }: Props) {
  const linked = recordBatches(event, batches)
  return (
    <section aria-label="About this event" className="flex flex-col gap-3 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <dl className="grid gap-x-6 gap-y-2 text-tide-900 sm:grid-cols-2 lg:grid-cols-4">
        <div>
          <dt className="text-sm text-tide-600">Kind</dt>
          <dd>
            {EVENT_KIND_LABELS[event.kind]} · {playbook.name}
          </dd>
        </div>
        <div>
          <dt className="text-sm text-tide-600">Starts</dt>
          <dd>{formatWallTime(event.localStart)}</dd>
        </div>
        <div>
          <dt className="text-sm text-tide-600">Tanks</dt>
          <dd>{tankCodes(event.tankIds, tanks, 6)}</dd>
        </div>
        <div>
          <dt className="text-sm text-tide-600">Status</dt>
          <dd>
            <EventStatusLabel status={event.status} /> · {event.taskCount} tasks
          </dd>
        </div>
      </dl>
      <FastingWindow from={event.fastingFrom} to={event.fastingTo} zone={zone} />
      {event.notes && <p className="whitespace-pre-line text-tide-800">{event.notes}</p>}
      {linked.length > 0 && (
        <ul aria-label="Batch records" className="flex flex-wrap gap-2">
          {linked.map((b) => (
            <li key={b.id}>
              <Link
                to={`/batches/${b.id}?event=${event.id}`}
                className="inline-flex min-h-11 items-center gap-2 rounded-lg bg-tide-700 px-4 font-semibold text-white hover:bg-tide-800"
              >
                <ClipboardList aria-hidden className="size-5" /> Batch record {b.code}
              </Link>
            </li>
          ))}
        </ul>
      )}
      {canManage && <EventActions event={event} />}
    </section>
  )
}
