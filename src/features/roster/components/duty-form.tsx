import { zodResolver } from '@hookform/resolvers/zod'
import { useForm } from 'react-hook-form'
import { toast } from 'sonner'
import type { StaffMember } from '#shared/schemas/person'
import { OnCallInputSchema, type OnCallInput } from '#shared/schemas/roster'
import { Field } from '../../../components/ui/field'
import { useCreateDuty } from '../api/use-roster-mutations'
import { applyServerErrors, personError } from '../utils/form-errors'
import { addDays } from '../utils/roster-dates'
import { FormFooter } from './form-footer'
import { PersonOptions } from './person-options'
import { SelectField } from '../../../components/ui/select-field'

/** One on-call duty: from the handover on the first day to the handover on the last. */
export function DutyForm({ staff, from, handoverTime }: { staff: StaffMember[]; from: string; handoverTime: string | null }) {
  const create = useCreateDuty()
  const eligible = staff.filter((p) => p.onCallEligible)
  const form = useForm<OnCallInput>({ resolver: zodResolver(OnCallInputSchema), defaultValues: { fromDate: from, toDate: addDays(from, 7) } })
  const errors = form.formState.errors

  const submit = form.handleSubmit((input) =>
    create.mutate(input, {
      onSuccess: (duty) => {
        toast.success(`${duty.personName} is on call from ${duty.fromDate} to ${duty.toDate}.`)
        form.reset({ fromDate: input.toDate, toDate: addDays(input.toDate, 7) })
      },
      onError: (e) => applyServerErrors(form, e),
    }),
  )

  return (
    <form noValidate onSubmit={submit} aria-label="On-call duty" className="grid gap-4 sm:grid-cols-3">
      <SelectField
        label="Person on call"
        {...form.register('personId', { setValueAs: (v) => (v === '' ? undefined : Number(v)) })}
        error={personError(errors.personId)}
      >
        <PersonOptions staff={eligible} />
      </SelectField>
      <Field label="From" type="date" {...form.register('fromDate')} error={errors.fromDate?.message} />
      <Field label="Until" type="date" {...form.register('toDate')} error={errors.toDate?.message} />
      <p className="text-sm text-tide-600 sm:col-span-full">
        Duty hands over at {handoverTime ?? 'the facility’s handover time'} on both days. Only people set up for on-call are listed
        {eligible.length === 0 && ' — nobody is yet; a manager can allow it on the People page'}.
      </p>
      <FormFooter submitLabel="Add duty" pending={create.isPending} serverError={errors.root?.server?.message} />
    </form>
  )
}
