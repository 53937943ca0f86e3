import { Trash2 } from 'lucide-react'
import { Controller, useFormContext } from 'react-hook-form'
import type { LadderInput } from '#shared/schemas/ladder'
import type { StaffMember } from '#shared/schemas/person'
import { Field } from '../../../components/ui/field'
import { ChannelPicker } from './channel-picker'
import { RecipientPicker } from './recipient-picker'

const plain = (message: string | undefined) => (message && /expected number/i.test(message) ? 'Enter a whole number of minutes' : message)

export function LadderStepFields({ index, staff, onRemove }: { index: number; staff: StaffMember[]; onRemove?: () => void }) {
  const { register, control, formState } = useFormContext<LadderInput>()
  const errors = formState.errors.steps?.[index]
  return (
    <li className="flex flex-col gap-3 rounded-lg border border-tide-200 p-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <p className="font-bold text-tide-900">Step {index + 1}</p>
        {onRemove && (
          <button
            type="button"
            onClick={onRemove}
            className="inline-flex min-h-11 items-center gap-1 rounded-lg px-3 font-semibold text-alarm-700 hover:bg-alarm-50"
          >
            <Trash2 aria-hidden className="size-4" /> Remove step {index + 1}
          </button>
        )}
      </div>
      <Field
        label={`Step ${index + 1}: minutes after the alert starts`}
        type="number"
        min={0}
        inputMode="numeric"
        className="sm:max-w-xs"
        {...register(`steps.${index}.afterMinutes`, { valueAsNumber: true })}
        error={plain(errors?.afterMinutes?.message)}
      />
      <Controller
        control={control}
        name={`steps.${index}.notify`}
        render={({ field }) => (
          <RecipientPicker
            label={`Step ${index + 1}: notify`}
            value={field.value}
            onChange={field.onChange}
            staff={staff}
            error={errors?.notify?.message ?? errors?.notify?.root?.message}
          />
        )}
      />
      <Controller
        control={control}
        name={`steps.${index}.channels`}
        render={({ field }) => (
          <ChannelPicker
            label={`Step ${index + 1}: send by`}
            value={field.value ?? ['email']}
            onChange={field.onChange}
            error={errors?.channels?.message ?? errors?.channels?.root?.message}
          />
        )}
      />
      <p className="text-sm text-tide-700">Whoever is on call at that moment is reached by every channel they accept, whatever is ticked here.</p>
    </li>
  )
}
