import { CircleDot, HeartPulse } from 'lucide-react'
import { clsx } from 'clsx'
import { useController } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'

const CHOICES = [
  { value: 'routine', label: 'Routine', hint: 'Missed work follows the usual ladder.', icon: CircleDot },
  { value: 'welfare_critical', label: 'Welfare-critical', hint: 'Animals are at risk if this is missed.', icon: HeartPulse },
] as const

export function PriorityChoice() {
  const { field } = useController<RoutineInput, 'priority'>({ name: 'priority' })
  const value = field.value ?? 'routine'
  return (
    <div role="radiogroup" aria-label="Priority" className="grid gap-2 sm:grid-cols-2">
      {CHOICES.map((c) => (
        <label
          key={c.value}
          className={clsx(
            'flex min-h-11 cursor-pointer items-start gap-3 rounded-lg border p-3',
            value === c.value ? 'border-tide-600 bg-tide-50 ring-1 ring-tide-600' : 'border-tide-200',
          )}
        >
          <input type="radio" name={field.name} value={c.value} checked={value === c.value} onChange={() => field.onChange(c.value)} className="mt-1 size-4" />
          <span className="flex flex-col">
            <span className="flex items-center gap-1 font-semibold text-tide-900">
              <c.icon aria-hidden className={clsx('size-4', c.value === 'welfare_critical' ? 'text-alarm-600' : 'text-tide-500')} />
              {c.label}
            </span>
            <span className="text-sm text-tide-600">{c.hint}</span>
          </span>
        </label>
      ))}
    </div>
  )
}
