import { clsx } from 'clsx'
import { Check } from 'lucide-react'

/** A round on/off button; the tick and aria-pressed say it is on, not the colour alone. */
export function ToggleChip({ label, pressed, onClick }: { label: string; pressed: boolean; onClick: () => void }) {
  return (
    <button
      type="button"
      aria-pressed={pressed}
      onClick={onClick}
      className={clsx(
        'inline-flex min-h-11 items-center gap-1.5 rounded-full px-3 text-sm font-semibold ring-1',
        pressed ? 'bg-tide-700 text-white ring-tide-700' : 'bg-white text-tide-800 ring-tide-200 hover:bg-tide-50',
      )}
    >
      {pressed && <Check aria-hidden className="size-4" />} {label}
    </button>
  )
}
