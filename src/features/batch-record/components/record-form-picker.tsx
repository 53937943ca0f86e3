import { clsx } from 'clsx'
import { Box, Droplets, FlaskConical, NotebookPen, Scale, type LucideIcon } from 'lucide-react'

export const RECORD_FORMS = ['box', 'water', 'weighing', 'bath', 'note'] as const
export type RecordFormName = (typeof RECORD_FORMS)[number]

const CHOICES: Record<RecordFormName, { label: string; icon: LucideIcon }> = {
  box: { label: 'Transport box', icon: Box },
  water: { label: 'Transport water', icon: Droplets },
  weighing: { label: 'Sample weighing', icon: Scale },
  bath: { label: 'Bath', icon: FlaskConical },
  note: { label: 'Note', icon: NotebookPen },
}

/** Which record to add: big buttons, one tap each on a phone. */
export function RecordFormPicker({ value, onChange }: { value: RecordFormName; onChange: (form: RecordFormName) => void }) {
  return (
    <div role="group" aria-label="Add to the record" className="grid grid-cols-2 gap-2 sm:grid-cols-5">
      {RECORD_FORMS.map((name) => {
        const c = CHOICES[name]
        const on = name === value
        return (
          <button
            key={name}
            type="button"
            aria-pressed={on}
            onClick={() => onChange(name)}
            className={clsx(
              'flex min-h-12 items-center gap-2 rounded-lg border px-3 text-left font-semibold',
              on ? 'border-tide-700 bg-tide-700 text-white' : 'border-tide-200 bg-white text-tide-800 hover:bg-tide-50',
            )}
          >
            <c.icon aria-hidden className="size-5 shrink-0" /> {c.label}
          </button>
        )
      })}
    </div>
  )
}
