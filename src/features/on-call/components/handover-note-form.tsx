import { zodResolver } from '@hookform/resolvers/zod'
import { Send } from 'lucide-react'
import { useForm } from 'react-hook-form'
import { toast } from 'sonner'
import { z } from 'zod'
import { HandoverNoteInputSchema } from '#shared/schemas/roster'
import { Button } from '../../../components/ui/button'
import { ApiError } from '../../../lib/api-client'
import { useAddHandoverNote } from '../api/use-add-handover-note'

type NoteInput = z.input<typeof HandoverNoteInputSchema>

export function HandoverNoteForm() {
  const add = useAddHandoverNote()
  const form = useForm<NoteInput>({ resolver: zodResolver(HandoverNoteInputSchema), defaultValues: { text: '' } })
  const error = form.formState.errors.text?.message

  const submit = form.handleSubmit((input) =>
    add.mutate(input, {
      onSuccess: () => {
        toast.success('Handover note saved.')
        form.reset()
      },
      onError: (e) => {
        if (e instanceof ApiError && e.fieldErrors?.text) form.setError('text', { message: e.fieldErrors.text[0] })
      },
    }),
  )

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-2">
      <label htmlFor="handover-note" className="text-sm font-semibold text-tide-800">
        Write a handover note
      </label>
      <textarea
        id="handover-note"
        rows={3}
        placeholder="What the next person should know: tanks to watch, rechecks due, anything unfinished"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? 'handover-note-error' : undefined}
        className={`rounded-lg border bg-white p-3 text-base ${error ? 'border-alarm-500' : 'border-tide-200'}`}
        {...form.register('text')}
      />
      {error && (
        <p id="handover-note-error" className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
      <Button type="submit" disabled={add.isPending} className="self-start">
        <Send aria-hidden className="size-5" /> {add.isPending ? 'Saving…' : 'Save note'}
      </Button>
    </form>
  )
}
