import { zodResolver } from '@hookform/resolvers/zod'
import { useState } from 'react'
import { Controller, useForm } from 'react-hook-form'
import { toast } from 'sonner'
import type { StaffMember } from '#shared/schemas/person'
import { RotationInputSchema, type RotationInput, type RotationResult } from '#shared/schemas/roster'
import { Field } from '../../../components/ui/field'
import { useGenerateRotation } from '../api/use-roster-mutations'
import { applyServerErrors, numberError } from '../utils/form-errors'
import { isMonday } from '../utils/roster-dates'
import { FormFooter } from './form-footer'
import { PeopleChecklist } from './people-checklist'
import { RotationResultView } from './rotation-result-view'

// The server refuses any other start day; saying so before sending is kinder.
const schema = RotationInputSchema.refine((r) => isMonday(r.from), { path: ['from'], message: 'Choose a Monday' })

/** Weekly duty shared among the chosen people from a Monday, so weekends fall evenly. */
export function RotationForm({ staff, from }: { staff: StaffMember[]; from: string }) {
  const generate = useGenerateRotation()
  const [result, setResult] = useState<RotationResult | null>(null)
  const eligible = staff.filter((p) => p.onCallEligible)
  const form = useForm<RotationInput>({ resolver: zodResolver(schema), defaultValues: { personIds: [], from, weeks: 8 } })
  const errors = form.formState.errors

  const submit = form.handleSubmit((input) =>
    generate.mutate(input, {
      onSuccess: (r) => {
        toast.success(`Planned ${r.duties.length} weeks of on-call duty.`)
        setResult(r)
      },
      onError: (e) => applyServerErrors(form, e),
    }),
  )

  return (
    <div className="flex flex-col gap-4">
      <form noValidate onSubmit={submit} aria-label="Rotation" className="grid gap-4 sm:grid-cols-2">
        <div className="sm:col-span-2">
          <Controller
            control={form.control}
            name="personIds"
            render={({ field }) => (
              <PeopleChecklist label="Who shares the duty" people={eligible} value={field.value} onChange={field.onChange} error={errors.personIds?.message} />
            )}
          />
        </div>
        <Field label="First Monday" type="date" {...form.register('from')} error={errors.from?.message} />
        <Field
          label="Number of weeks"
          type="number"
          min={1}
          max={52}
          inputMode="numeric"
          {...form.register('weeks', { valueAsNumber: true })}
          error={numberError(errors.weeks?.message)}
        />
        <p className="text-sm text-tide-600 sm:col-span-full">Duty hands over each Monday. Duties already planned in these weeks are replaced.</p>
        <FormFooter submitLabel="Plan the rotation" pending={generate.isPending} serverError={errors.root?.server?.message} />
      </form>
      {result && <RotationResultView result={result} />}
    </div>
  )
}
