import { CalendarRange } from 'lucide-react'
import { useState } from 'react'
import type { Batch, Tank } from '#shared/schemas/facility'
import type { FacilityEvent } from '#shared/schemas/playbook'
import { EventItem } from './event-item'

type Props = { events: FacilityEvent[]; tanks: Tank[]; batches: Batch[]; zone: string; canManage: boolean }

/** Planned events first; ended and cancelled ones on request. */
export function EventList({ events, tanks, batches, zone, canManage }: Props) {
  const [showPast, setShowPast] = useState(false)
  const planned = events.filter((e) => e.status === 'planned')
  const finished = events.filter((e) => e.status !== 'planned').reverse()
  const shown = showPast ? [...planned, ...finished] : planned
  return (
    <div className="flex flex-col gap-2">
      {shown.length === 0 ? (
        <p className="flex items-center gap-3 rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
          <CalendarRange aria-hidden className="size-5 shrink-0 text-tide-500" /> No planned events. Start one from a playbook.
        </p>
      ) : (
        <ul aria-label="Events" className="divide-y divide-tide-100 rounded-xl border border-tide-200 bg-white">
          {shown.map((e) => (
            <EventItem key={e.id} event={e} tanks={tanks} batches={batches} zone={zone} canManage={canManage} />
          ))}
        </ul>
      )}
      {finished.length > 0 && (
        <button type="button" onClick={() => setShowPast((s) => !s)} className="min-h-11 self-start font-semibold text-tide-700 hover:underline">
          {showPast ? 'Hide ended and cancelled events' : `Show ${finished.length} ended or cancelled`}
        </button>
      )}
    </div>
  )
}
