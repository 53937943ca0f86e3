import { useFormContext } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { FormSection } from './form-section'
import { OptionalDateField } from './optional-date-field'
import { SkipDatesField } from './skip-dates-field'

export function ActivePeriodFields() {
  const { register } = useFormContext<RoutineInput>()
  return (
    <FormSection title="When it applies" className="sm:grid-cols-2">
      <OptionalDateField name="activeFrom" label="Active from" hint="Leave empty to start with the rule." />
      <OptionalDateField name="activeTo" label="Active until" hint="Leave empty to run on." />
      <label className="flex min-h-11 items-start gap-3 text-tide-800 sm:col-span-2">
        <input type="checkbox" className="mt-0.5 size-5 shrink-0" {...register('paused')} />
        <span>
          <span className="font-semibold">Paused</span>
          <span className="block text-sm text-tide-600">Untouched future tasks are removed; resume to plan them again.</span>
        </span>
      </label>
      <SkipDatesField />
    </FormSection>
  )
}
