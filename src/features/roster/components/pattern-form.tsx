import { zodResolver } from '@hookform/resolvers/zod'
import { Controller, useForm } from 'react-hook-form'
import { toast } from 'sonner'
import type { StaffMember } from '#shared/schemas/person'
import { SHIFT_KINDS, ShiftPatternInputSchema, type Shift, type ShiftPatternInput } from '#shared/schemas/roster'
import { Field } from '../../../components/ui/field'
import { useApplyPattern } from '../api/use-roster-mutations'
import { applyServerErrors, personError } from '../utils/form-errors'
import { addDays } from '../utils/roster-dates'
import { SHIFT_KIND_LOOK } from '../utils/shift-kinds'
import { FormFooter } from './form-footer'
import { PersonOptions } from './person-options'
import { SelectField } from '../../../components/ui/select-field'
import { WeekdayPicker } from './weekday-picker'

/** A weekly pattern (e.g. early shifts Monday to Friday) turned into shifts over a period. */
export function PatternForm({ staff, from }: { staff: StaffMember[]; from: string }) {
  const apply = useApplyPattern()
  const form = useForm<ShiftPatternInput>({
    resolver: zodResolver(ShiftPatternInputSchema),
    defaultValues: {
      weekdays: ['MO', 'TU', 'WE', 'TH', 'FR'],
      kind: 'day',
      start: SHIFT_KIND_LOOK.day.start,
      end: SHIFT_KIND_LOOK.day.end,
      from,
      to: addDays(from, 27),
    },
  })
  const errors = form.formState.errors
  const kind = form.register('kind', {
    onChange: (e) => {
      const look = SHIFT_KIND_LOOK[e.target.value as Shift['kind']]
      form.setValue('start', look.start)
      form.setValue('end', look.end)
    },
  })

  const submit = form.handleSubmit((input) =>
    apply.mutate(input, {
      onSuccess: ({ created, skipped }) =>
        toast.success(`Added ${created} shifts${skipped ? `; ${skipped} days were left alone because the person already works then` : ''}.`),
      onError: (e) => applyServerErrors(form, e),
    }),
  )

  return (
    <form noValidate onSubmit={submit} aria-label="Weekly pattern" className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
      <SelectField
        label="Person"
        {...form.register('personId', { setValueAs: (v) => (v === '' ? undefined : Number(v)) })}
        error={personError(errors.personId)}
      >
        <PersonOptions staff={staff} />
      </SelectField>
      <SelectField label="Kind" {...kind}>
        {SHIFT_KINDS.map((k) => (
          <option key={k} value={k}>
            {SHIFT_KIND_LOOK[k].label}
          </option>
        ))}
      </SelectField>
      <Field label="Starts" type="time" {...form.register('start')} error={errors.start?.message} />
      <Field label="Ends" type="time" {...form.register('end')} error={errors.end?.message} />
      <div className="sm:col-span-2">
        <Controller
          control={form.control}
          name="weekdays"
          render={({ field }) => <WeekdayPicker value={field.value} onChange={field.onChange} error={errors.weekdays?.message} />}
        />
      </div>
      <Field label="From" type="date" {...form.register('from')} error={errors.from?.message} />
      <Field label="To" type="date" {...form.register('to')} error={errors.to?.message} />
      <p className="text-sm text-tide-600 sm:col-span-full">Days the person already has a shift are left as they are.</p>
      <FormFooter submitLabel="Add these shifts" pending={apply.isPending} serverError={errors.root?.server?.message} />
    </form>
  )
}
