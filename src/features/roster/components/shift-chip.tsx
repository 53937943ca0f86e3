import type { Shift } from '#shared/schemas/roster'
import { SHIFT_KIND_LOOK } from '../utils/shift-kinds'

export function ShiftChip({ shift, onEdit }: { shift: Shift; onEdit: (shift: Shift) => void }) {
  const look = SHIFT_KIND_LOOK[shift.kind]
  return (
    <button
      type="button"
      onClick={() => onEdit(shift)}
      aria-label={`Edit ${shift.personName}’s ${look.label.toLowerCase()} shift on ${shift.date}, ${shift.start} to ${shift.end}`}
      className="flex w-full flex-col items-start rounded-md bg-tide-100 px-1.5 py-1 text-left text-xs text-tide-900 hover:bg-tide-200"
    >
      <span className="inline-flex items-center gap-1 font-bold">
        <look.icon aria-hidden className="size-3.5 shrink-0" /> {look.label}
      </span>
      <span className="tabular-nums">
        {shift.start}–{shift.end}
      </span>
    </button>
  )
}
