import { Plus } from 'lucide-react'
import { useFieldArray, useFormContext } from 'react-hook-form'
import type { PlaybookInput } from '#shared/schemas/playbook'
import { Button } from '../../../components/ui/button'
import { newStep } from '../utils/playbook-form-values'
import { StepFields } from './step-fields'

export function StepListFields() {
  const {
    control,
    formState: { errors },
  } = useFormContext<PlaybookInput>()
  const steps = useFieldArray({ control, name: 'steps' })
  return (
    <div className="flex flex-col gap-3">
      {steps.fields.map((field, index) => (
        <StepFields key={field.id} index={index} count={steps.fields.length} onMove={(to) => steps.move(index, to)} onRemove={() => steps.remove(index)} />
      ))}
      {errors.steps?.root?.message && <p className="text-sm font-semibold text-alarm-700">{errors.steps.root.message}</p>}
      <Button type="button" variant="secondary" className="self-start" onClick={() => steps.append(newStep())}>
        <Plus aria-hidden className="size-5" /> Add step
      </Button>
    </div>
  )
}
