import { useFormContext } from 'react-hook-form'
import { CATEGORY_LABELS, ROUTINE_CATEGORIES, type RoutineInput } from '#shared/schemas/routine'
import { Field } from '../../../components/ui/field'
import { FormSection } from './form-section'
import { PriorityChoice } from './priority-choice'
import { SelectField } from '../../../components/ui/select-field'

export function RoutineBasicsFields() {
  const {
    register,
    formState: { errors },
  } = useFormContext<RoutineInput>()
  return (
    <FormSection title="What" className="sm:grid-cols-2">
      <Field label="Name" {...register('name')} error={errors.name?.message} />
      <SelectField label="Category" {...register('category')} error={errors.category?.message}>
        {ROUTINE_CATEGORIES.map((c) => (
          <option key={c} value={c}>
            {CATEGORY_LABELS[c]}
          </option>
        ))}
      </SelectField>
      <div className="flex flex-col gap-1 sm:col-span-2">
        <label htmlFor="routine-instructions" className="text-sm font-semibold text-tide-800">
          Instructions
        </label>
        <textarea id="routine-instructions" rows={3} {...register('instructions')} className="rounded-lg border border-tide-200 bg-white px-3 py-2 text-base" />
        {errors.instructions && <p className="text-sm font-semibold text-alarm-700">{errors.instructions.message}</p>}
      </div>
      <div className="sm:col-span-2">
        <PriorityChoice />
      </div>
    </FormSection>
  )
}
