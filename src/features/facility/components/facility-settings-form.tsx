import { zodResolver } from '@hookform/resolvers/zod'
import { useId } from 'react'
import { useForm } from 'react-hook-form'
import { toast } from 'sonner'
import { UpdateFacilityInputSchema, type Facility, type UpdateFacilityInput } from '#shared/schemas/facility'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { useUpdateFacility } from '../api/use-update-facility'
import { applyServerErrors } from '../utils/apply-server-errors'
import { formMessages } from '../utils/form-messages'

const TIME_ZONES = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : []

export function FacilitySettingsForm({ facility, canEdit }: { facility: Facility; canEdit: boolean }) {
  const zonesId = useId()
  const update = useUpdateFacility()
  const { id: _id, ...values } = facility
  const form = useForm<UpdateFacilityInput>({ resolver: zodResolver(UpdateFacilityInputSchema, { error: formMessages }), values })
  const errors = form.formState.errors

  const submit = form.handleSubmit((input) =>
    update.mutate(input, {
      onSuccess: () => toast.success('Facility settings saved.'),
      onError: (error) => applyServerErrors(form, error),
    }),
  )

  return (
    <form noValidate onSubmit={submit} aria-label="Facility settings" className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4">
      <fieldset disabled={!canEdit} className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="sr-only">Facility settings</legend>
        <Field label="Facility name" {...form.register('name')} error={errors.name?.message} />
        <Field
          label="Time zone"
          list={zonesId}
          autoComplete="off"
          hint="Routines, rounds and handover follow this zone, e.g. Europe/Oslo."
          {...form.register('timeZone')}
          error={errors.timeZone?.message}
        />
        <datalist id={zonesId}>
          {TIME_ZONES.map((tz) => (
            <option key={tz} value={tz} />
          ))}
        </datalist>
        <Field
          label="On-call handover"
          type="time"
          hint="When on-call duty changes hands each day."
          {...form.register('handoverTime')}
          error={errors.handoverTime?.message}
        />
        <Field
          label="Quarantine (days)"
          type="number"
          inputMode="numeric"
          hint="Default length for a new arrival."
          {...form.register('quarantineDays', { valueAsNumber: true })}
          error={errors.quarantineDays?.message}
        />
        <Field
          label="Arrival temperature gap (°C)"
          type="number"
          inputMode="decimal"
          step="0.1"
          hint="Largest gap between transport water and tank water before fish go in."
          {...form.register('arrivalTempDiffLimitC', { valueAsNumber: true })}
          error={errors.arrivalTempDiffLimitC?.message}
        />
        <Field
          label="Oxygen reserve (hours)"
          type="number"
          inputMode="decimal"
          step="any"
          hint="The bottled oxygen must last at least this long."
          {...form.register('minOxygenHours', { valueAsNumber: true })}
          error={errors.minOxygenHours?.message}
        />
      </fieldset>
      {errors.root?.server && (
        <p role="alert" className="rounded-lg bg-alarm-50 p-3 text-sm font-semibold text-alarm-700">
          {errors.root.server.message}
        </p>
      )}
      {canEdit ? (
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={update.isPending || !form.formState.isDirty}>
            {update.isPending ? 'Saving…' : 'Save settings'}
          </Button>
          {form.formState.isDirty && (
            <Button type="button" variant="ghost" onClick={() => form.reset()}>
              Undo changes
            </Button>
          )}
        </div>
      ) : (
        <p className="text-sm text-tide-600">Only a manager can change these settings.</p>
      )}
    </form>
  )
}
