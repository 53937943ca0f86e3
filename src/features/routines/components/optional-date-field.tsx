import { useController } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { Field } from '../../../components/ui/field'

/** A date input for a nullable date: empty means null. */
export function OptionalDateField({ name, label, hint }: { name: 'activeFrom' | 'activeTo'; label: string; hint: string }) {
  const { field, fieldState } = useController<RoutineInput, typeof name>({ name })
  return (
    <Field
      label={label}
      type="date"
      hint={hint}
      name={field.name}
      ref={field.ref}
      value={field.value ?? ''}
      onChange={(e) => field.onChange(e.target.value || null)}
      onBlur={field.onBlur}
      error={fieldState.error?.message}
    />
  )
}
