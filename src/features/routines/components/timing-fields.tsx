import { useFormContext } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { Field } from '../../../components/ui/field'
import { plainNumberError } from '../utils/routine-form-schema'

export function TimingFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<RoutineInput>()
  const minutes = { type: 'number', inputMode: 'numeric', min: 0 } as const
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <Field
        label="Takes (minutes)"
        {...minutes}
        min={1}
        {...register('durationMinutes', { valueAsNumber: true })}
        error={plainNumberError(errors.durationMinutes?.message)}
      />
      <Field
        label="Opens before (minutes)"
        hint="The task opens this long before its time."
        {...minutes}
        {...register('windowBeforeMinutes', { valueAsNumber: true })}
        error={plainNumberError(errors.windowBeforeMinutes?.message)}
      />
      <Field
        label="Grace (minutes)"
        hint="Overdue until then, missed after."
        {...minutes}
        {...register('graceMinutes', { valueAsNumber: true })}
        error={plainNumberError(errors.graceMinutes?.message)}
      />
    </div>
  )
}
