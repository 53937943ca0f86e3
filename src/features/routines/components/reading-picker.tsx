import { useController } from 'react-hook-form'
import type { Parameter } from '#shared/schemas/parameter'
import type { RoutineInput } from '#shared/schemas/routine'
import { FormSection } from './form-section'

export function ReadingPicker({ parameters }: { parameters: Parameter[] }) {
  const { field, fieldState } = useController<RoutineInput, 'requiredReadings'>({ name: 'requiredReadings' })
  const chosen = field.value ?? []
  // Derived readings are worked out from others, never typed in; keep one only if already chosen.
  const offered = parameters.filter((p) => !p.derived || chosen.includes(p.key))
  const toggle = (key: string, on: boolean) => field.onChange(on ? [...chosen, key] : chosen.filter((k) => k !== key))
  return (
    <FormSection title="Readings" description="The task cannot be completed without these readings.">
      {offered.length === 0 ? (
        <p className="text-tide-700">No reading parameters are set up for the facility yet.</p>
      ) : (
        <div role="group" aria-label="Required readings" className="grid gap-x-4 sm:grid-cols-2">
          {offered.map((p) => (
            <label key={p.key} className="flex min-h-11 cursor-pointer items-center gap-3 text-tide-900">
              <input type="checkbox" className="size-5 shrink-0" checked={chosen.includes(p.key)} onChange={(e) => toggle(p.key, e.target.checked)} />
              <span>
                {p.name} <span className="text-tide-600">({p.unit})</span>
              </span>
            </label>
          ))}
        </div>
      )}
      {fieldState.error && <p className="text-sm font-semibold text-alarm-700">{fieldState.error.message}</p>}
    </FormSection>
  )
}
