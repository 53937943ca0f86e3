import { Phone, Trash2 } from 'lucide-react'
import { toast } from 'sonner'
import type { OnCallDuty } from '#shared/schemas/roster'
import { useDeleteDuty } from '../api/use-roster-mutations'
import { dayMonth, weekdayShort } from '../utils/roster-dates'

const day = (iso: string) => `${weekdayShort(iso)} ${dayMonth(iso)}`

/** The duties touching the visible range, each removable. */
export function DutyList({ duties }: { duties: OnCallDuty[] }) {
  const remove = useDeleteDuty()
  if (duties.length === 0) return <p className="text-sm text-tide-700">No on-call duty in these days yet.</p>
  return (
    <ul aria-label="On-call duties" className="divide-y divide-tide-100 rounded-lg border border-tide-200">
      {duties.map((d) => (
        <li key={d.id} className="flex items-center justify-between gap-3 px-3 py-1">
          <span className="flex items-center gap-2 text-tide-900">
            <Phone aria-hidden className="size-4 text-tide-600" />
            <span>
              <span className="font-semibold">{d.personName}</span> · {day(d.fromDate)} – {day(d.toDate)}
            </span>
          </span>
          <button
            type="button"
            aria-label={`Remove ${d.personName}’s duty from ${d.fromDate}`}
            disabled={remove.isPending}
            onClick={() => remove.mutate(d.id, { onSuccess: () => toast.success(`Removed ${d.personName}’s duty.`) })}
            className="inline-flex min-h-11 min-w-11 items-center justify-center rounded-lg text-alarm-700 hover:bg-alarm-50"
          >
            <Trash2 aria-hidden className="size-4" />
          </button>
        </li>
      ))}
    </ul>
  )
}
