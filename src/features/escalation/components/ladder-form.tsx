import { zodResolver } from '@hookform/resolvers/zod'
import { Plus, Save } from 'lucide-react'
import { FormProvider, useFieldArray, useForm, type FieldPath } from 'react-hook-form'
import { toast } from 'sonner'
import { LadderInputSchema, type Ladder, type LadderInput } from '#shared/schemas/ladder'
import type { StaffMember } from '#shared/schemas/person'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import { useSaveLadder } from '../api/use-save-ladder'
import { LadderStepFields } from './ladder-step-fields'

const NEW_LADDER: LadderInput = { name: '', steps: [{ afterMinutes: 0, notify: [{ kind: 'assignee' }] }] }

export function LadderForm({ ladder, staff, onDone }: { ladder: Ladder | null; staff: StaffMember[]; onDone: () => void }) {
  const save = useSaveLadder()
  const form = useForm<LadderInput>({
    resolver: zodResolver(LadderInputSchema),
    defaultValues: ladder ? { name: ladder.name, steps: ladder.steps } : NEW_LADDER,
  })
  const steps = useFieldArray({ control: form.control, name: 'steps' })
  const errors = form.formState.errors
  const stepsError = errors.steps?.message ?? errors.steps?.root?.message

  const submit = form.handleSubmit((input) =>
    save.mutate(
      { id: ladder?.id ?? null, input },
      {
        onSuccess: (saved) => {
          toast.success(`Saved the ladder “${saved.name}”.`)
          onDone()
        },
        onError: (error) => {
          if (!(error instanceof ApiError)) return
          for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) form.setError(field as FieldPath<LadderInput>, { message: messages[0] })
        },
      },
    ),
  )

  const addStep = () => {
    const last = form.getValues('steps').at(-1)
    steps.append({ afterMinutes: (last?.afterMinutes ?? 0) + 30, notify: [{ kind: 'managers' }] })
  }

  return (
    <FormProvider {...form}>
      <form
        noValidate
        onSubmit={submit}
        aria-label={ladder ? `Edit ladder ${ladder.name}` : 'New ladder'}
        className="flex flex-col gap-4 rounded-xl border border-tide-300 bg-white p-4"
      >
        <Field label="Ladder name" {...form.register('name')} error={errors.name?.message} />
        <ol className="flex flex-col gap-3">
          {steps.fields.map((f, i) => (
            <LadderStepFields key={f.id} index={i} staff={staff} onRemove={steps.fields.length > 1 ? () => steps.remove(i) : undefined} />
          ))}
        </ol>
        {stepsError && (
          <p role="alert" className="text-sm font-semibold text-alarm-700">
            {stepsError}
          </p>
        )}
        <div className="flex flex-wrap gap-2">
          {steps.fields.length < 10 && (
            <Button type="button" variant="secondary" onClick={addStep}>
              <Plus aria-hidden className="size-5" /> Add a step
            </Button>
          )}
          <Button type="submit" disabled={save.isPending}>
            <Save aria-hidden className="size-5" /> {save.isPending ? 'Saving…' : 'Save ladder'}
          </Button>
          <Button type="button" variant="ghost" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </FormProvider>
  )
}
