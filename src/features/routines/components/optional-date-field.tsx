import { useController } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { Field } from '../../../components/ui/field'

/** A date input for a nullable date: empty means null. */
export function OptionalDateField({ name, label, hint }: { name: 'activeFrom' | 'activeTo'; label: string; hint: string }) {
  const {
    field: { ref, value, onChange, onBlur },
    fieldState,
  } = useController<RoutineInput, typeof name>({ name })
  return (
    <Field
      label={label}
      type="date"
      hint={hint}
      name={name}
      ref={ref}
      value={value ?? ''}
      onChange={(e) => onChange(e.target.value || null)}
      onBlur={onBlur}
      error={fieldState.error?.message}
    />
  )
}
