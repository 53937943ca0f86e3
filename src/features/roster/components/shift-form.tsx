import { zodResolver } from '@hookform/resolvers/zod'
import { useForm } from 'react-hook-form'
import { toast } from 'sonner'
import type { StaffMember } from '#shared/schemas/person'
import { SHIFT_KINDS, ShiftInputSchema, type Shift, type ShiftInput } from '#shared/schemas/roster'
import { Field } from '../../../components/ui/field'
import { useCreateShift, useUpdateShift } from '../api/use-roster-mutations'
import { applyServerErrors, personError } from '../utils/form-errors'
import { longDay } from '../utils/roster-dates'
import { SHIFT_KIND_LOOK } from '../utils/shift-kinds'
import { DeleteShiftButton } from './delete-shift-button'
import { FormFooter } from './form-footer'
import { PersonOptions } from './person-options'
import { SelectField } from '../../../components/ui/select-field'

/** Add one shift, or edit or delete the one chosen in the grid. */
export function ShiftForm({
  shift,
  initial,
  staff,
  onDone,
}: {
  shift: Shift | null
  initial: { personId: number | null; date: string }
  staff: StaffMember[]
  onDone: () => void
}) {
  const create = useCreateShift()
  const update = useUpdateShift()
  const form = useForm<ShiftInput>({
    resolver: zodResolver(ShiftInputSchema),
    defaultValues: shift
      ? { personId: shift.personId, date: shift.date, kind: shift.kind, start: shift.start, end: shift.end }
      : { personId: initial.personId ?? undefined, date: initial.date, kind: 'day', start: SHIFT_KIND_LOOK.day.start, end: SHIFT_KIND_LOOK.day.end },
  })
  const errors = form.formState.errors
  const kind = form.register('kind', {
    onChange: (e) => {
      if (shift) return
      const look = SHIFT_KIND_LOOK[e.target.value as Shift['kind']]
      form.setValue('start', look.start)
      form.setValue('end', look.end)
    },
  })

  const submit = form.handleSubmit((input) => {
    const done = {
      onSuccess: () => {
        toast.success(shift ? 'Shift saved.' : `Shift added on ${longDay(input.date)}.`)
        onDone()
      },
      onError: (e: Error) => applyServerErrors(form, e),
    }
    if (shift) update.mutate({ id: shift.id, input }, done)
    else create.mutate(input, done)
  })

  return (
    <form
      noValidate
      onSubmit={submit}
      aria-label={shift ? `Edit shift of ${shift.personName}` : 'Add a shift'}
      className="grid gap-4 sm:grid-cols-2 lg:grid-cols-5"
    >
      {shift && (
        <p className="font-semibold text-tide-900 sm:col-span-full">
          Editing {shift.personName}’s {SHIFT_KIND_LOOK[shift.kind].label.toLowerCase()} shift on {longDay(shift.date)}
        </p>
      )}
      <SelectField
        label="Person"
        {...form.register('personId', { setValueAs: (v) => (v === '' ? undefined : Number(v)) })}
        error={personError(errors.personId)}
      >
        <PersonOptions staff={staff} extra={shift ? { id: shift.personId, name: shift.personName } : undefined} />
      </SelectField>
      <Field label="Date" type="date" {...form.register('date')} error={errors.date?.message} />
      <SelectField label="Kind" {...kind}>
        {SHIFT_KINDS.map((k) => (
          <option key={k} value={k}>
            {SHIFT_KIND_LOOK[k].label}
          </option>
        ))}
      </SelectField>
      <Field label="Starts" type="time" {...form.register('start')} error={errors.start?.message} />
      <Field label="Ends" type="time" hint="Before the start means past midnight." {...form.register('end')} error={errors.end?.message} />
      <FormFooter
        submitLabel={shift ? 'Save shift' : 'Add shift'}
        pending={create.isPending || update.isPending}
        serverError={errors.root?.server?.message}
        onCancel={onDone}
      >
        {shift && <DeleteShiftButton shift={shift} onDeleted={onDone} />}
      </FormFooter>
    </form>
  )
}
