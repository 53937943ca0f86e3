import { Phone, Plus } from 'lucide-react'
import type { Shift } from '#shared/schemas/roster'
import { ShiftChip } from './shift-chip'

/** One person on one day: their shifts, whether they hold on-call, and a way to add a shift. */
export function RosterCell({
  personName,
  date,
  shifts,
  onCall,
  onAdd,
  onEdit,
}: {
  personName: string
  date: string
  shifts: Shift[]
  onCall: boolean
  onAdd: () => void
  onEdit: (shift: Shift) => void
}) {
  return (
    <div className="flex min-h-16 flex-col gap-1">
      {onCall && (
        <span className="inline-flex items-center gap-1 rounded-md bg-tide-800 px-1.5 py-0.5 text-xs font-bold text-white">
          <Phone aria-hidden className="size-3.5" /> On call
        </span>
      )}
      {shifts.map((s) => (
        <ShiftChip key={s.id} shift={s} onEdit={onEdit} />
      ))}
      <button
        type="button"
        onClick={onAdd}
        aria-label={`Add a shift for ${personName} on ${date}`}
        className="flex min-h-8 items-center justify-center rounded-md border border-dashed border-tide-200 text-tide-400 hover:border-tide-400 hover:text-tide-700"
      >
        <Plus aria-hidden className="size-4" />
      </button>
    </div>
  )
}
