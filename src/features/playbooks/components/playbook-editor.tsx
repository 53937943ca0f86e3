import { zodResolver } from '@hookform/resolvers/zod'
import { CircleAlert, Save } from 'lucide-react'
import { FormProvider, useForm, type FieldPath } from 'react-hook-form'
import { toast } from 'sonner'
import type { z } from 'zod'
import { PlaybookInputSchema, type Playbook, type PlaybookInput } from '#shared/schemas/playbook'
import { Button } from '../../../components/ui/button'
import { ApiError } from '../../../lib/api-client'
import { useSavePlaybook } from '../api/use-save-playbook'
import { newPlaybookValues, playbookValues } from '../utils/playbook-form-values'
import { PlaybookBasicsFields } from './playbook-basics-fields'
import { StepListFields } from './step-list-fields'

type Props = { playbook: Playbook | null; onDone: () => void }

/** The manager's editor for a playbook and its steps; saving changes future events only. */
export function PlaybookEditor({ playbook, onDone }: Props) {
  const save = useSavePlaybook()
  const form = useForm<PlaybookInput, unknown, z.output<typeof PlaybookInputSchema>>({
    resolver: zodResolver(PlaybookInputSchema),
    defaultValues: playbook ? playbookValues(playbook) : newPlaybookValues(),
  })
  const errors = form.formState.errors

  const submit = form.handleSubmit((input) =>
    save.mutate(
      { id: playbook?.id ?? null, input },
      {
        onSuccess: (saved) => {
          toast.success(`Saved “${saved.name}”. Events started from now on follow these steps.`)
          onDone()
        },
        onError: (error) => {
          if (!(error instanceof ApiError) || error.code !== 'validation_failed') return
          for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) {
            form.setError(field as FieldPath<PlaybookInput>, { message: messages[0] })
          }
          form.setError('root.server', { message: error.message })
        },
      },
    ),
  )

  return (
    <FormProvider {...form}>
      <form
        noValidate
        onSubmit={submit}
        aria-label={playbook ? `Edit ${playbook.name}` : 'New playbook'}
        className="flex flex-col gap-4 rounded-xl border border-tide-300 bg-white p-4 md:p-5"
      >
        <h3 className="text-lg font-bold text-tide-900">{playbook ? `Edit “${playbook.name}”` : 'New playbook'}</h3>
        <PlaybookBasicsFields />
        <h4 className="font-bold text-tide-900">Steps</h4>
        <p className="-mt-3 text-sm text-tide-600">Times are facility time. Events already started keep the tasks they made.</p>
        <StepListFields />
        {Object.keys(errors).length > 0 && form.formState.isSubmitted && (
          <p role="alert" className="flex items-start gap-2 font-semibold text-alarm-700">
            <CircleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
            {errors.root?.server?.message ?? 'Some fields need attention; see the messages above.'}
          </p>
        )}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={save.isPending}>
            <Save aria-hidden className="size-5" /> {save.isPending ? 'Saving…' : 'Save playbook'}
          </Button>
          <Button type="button" variant="ghost" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </FormProvider>
  )
}
