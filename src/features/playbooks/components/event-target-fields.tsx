import { Controller, useFormContext } from 'react-hook-form'
import type { Area, Batch, Tank } from '#shared/schemas/facility'
import type { EventFormValues } from '../utils/event-form'
import { SelectField } from '../../../components/ui/select-field'
import { TankChecklist } from './tank-checklist'

const choice = 'flex min-h-11 cursor-pointer items-center gap-2 rounded-lg border border-tide-200 px-3 has-[:checked]:border-tide-600 has-[:checked]:bg-tide-50'

/** Which fish the event is for: chosen tanks, or a batch (the event then covers the batch's tanks). */
export function EventTargetFields({ tanks, areas, batches }: { tanks: Tank[]; areas: Area[]; batches: Batch[] }) {
  const {
    register,
    control,
    watch,
    formState: { errors },
  } = useFormContext<EventFormValues>()
  const target = watch('target')
  const live = batches.filter((b) => b.status === 'quarantine' || b.status === 'active')
  return (
    <fieldset className="flex min-w-0 flex-col gap-3">
      <legend className="text-sm font-semibold text-tide-800">For</legend>
      <div className="flex flex-wrap gap-2">
        <label className={choice}>
          <input type="radio" value="tanks" className="size-5" {...register('target')} /> Chosen tanks
        </label>
        <label className={choice}>
          <input type="radio" value="batch" className="size-5" {...register('target')} /> A batch and its tanks
        </label>
      </div>
      {target === 'tanks' ? (
        <Controller
          control={control}
          name="tankIds"
          render={({ field, fieldState }) => (
            <TankChecklist tanks={tanks} areas={areas} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />
          )}
        />
      ) : (
        <SelectField label="Batch" error={errors.batchId?.message} {...register('batchId')}>
          <option value="">Choose a batch</option>
          {live.map((b) => (
            <option key={b.id} value={b.id}>
              {b.code} · {b.species} ({b.tankIds.length} {b.tankIds.length === 1 ? 'tank' : 'tanks'})
            </option>
          ))}
        </SelectField>
      )}
    </fieldset>
  )
}
