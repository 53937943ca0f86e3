import { ListChecks } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { Batch, Tank } from '#shared/schemas/facility'
import type { FacilityEvent } from '#shared/schemas/playbook'
import { EVENT_KIND_LABELS } from '../utils/kind-labels'
import { tankCodes } from '../utils/tank-text'
import { formatWallTime } from '../utils/zone-format'
import { EventActions } from './event-actions'
import { EventStatusLabel } from './event-status-label'
import { FastingWindow } from './fasting-window'

type Props = { event: FacilityEvent; tanks: Tank[]; batches: Batch[]; zone: string; canManage: boolean }

export function EventItem({ event, tanks, batches, zone, canManage }: Props) {
  const batch = batches.find((b) => b.id === event.batchId)
  return (
    <li aria-label={event.title} className="grid gap-x-6 gap-y-2 px-4 py-3 lg:grid-cols-[minmax(0,1.3fr)_minmax(0,1.6fr)_auto] lg:items-start">
      <div className="min-w-0">
        <Link to={`/events/${event.id}`} className="text-lg font-semibold text-tide-900 underline-offset-2 hover:underline">
          {event.title}
        </Link>
        <p className="text-sm text-tide-700">
          {EVENT_KIND_LABELS[event.kind]} · starts {formatWallTime(event.localStart)}
        </p>
        <p className="mt-1">
          <EventStatusLabel status={event.status} />
        </p>
      </div>
      <div className="flex min-w-0 flex-col gap-1 text-sm text-tide-800">
        <p>
          {batch ? `Batch ${batch.code} · ` : ''}Tanks: {tankCodes(event.tankIds, tanks)}
        </p>
        <FastingWindow from={event.fastingFrom} to={event.fastingTo} zone={zone} />
        <p className="flex items-center gap-2">
          <ListChecks aria-hidden className="size-4 text-tide-600" /> {event.taskCount} {event.taskCount === 1 ? 'task' : 'tasks'}
        </p>
      </div>
      {canManage && <EventActions event={event} />}
    </li>
  )
}
