import { useFormContext } from 'react-hook-form'
import { EVENT_KINDS, FASTING_KINDS, type PlaybookInput } from '#shared/schemas/playbook'
import { Field } from '../../../components/ui/field'
import { EVENT_KIND_LABELS } from '../utils/kind-labels'
import { asNumber } from '../utils/playbook-form-values'
import { FastingCaution } from './fasting-caution'
import { SelectField } from '../../../components/ui/select-field'
import { TextAreaField } from '../../../components/ui/text-area-field'

export function PlaybookBasicsFields() {
  const {
    register,
    watch,
    formState: { errors },
  } = useFormContext<PlaybookInput>()
  const fasts = FASTING_KINDS.includes(watch('kind'))
  return (
    <div className="grid gap-4 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)]">
      <Field label="Name" error={errors.name?.message} {...register('name')} />
      <SelectField label="Kind of event" {...register('kind')}>
        {EVENT_KINDS.map((k) => (
          <option key={k} value={k}>
            {EVENT_KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      {fasts ? (
        <Field
          label="Fasting before (hours)"
          type="number"
          inputMode="numeric"
          min={0}
          max={168}
          error={errors.fastingHours?.message}
          {...register('fastingHours', { setValueAs: asNumber })}
        />
      ) : (
        <p className="self-end pb-2 text-sm text-tide-600">This kind of event holds no feeds.</p>
      )}
      <TextAreaField label="Description" className="md:col-span-3" error={errors.description?.message} {...register('description')} />
      {fasts && (
        <div className="md:col-span-3">
          <FastingCaution />
        </div>
      )}
    </div>
  )
}
