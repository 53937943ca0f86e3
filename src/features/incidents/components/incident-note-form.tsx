import { MessageSquarePlus } from 'lucide-react'
import { useState } from 'react'
import { toast } from 'sonner'
import { IncidentNoteInputSchema } from '#shared/schemas/incident'
import { Button } from '../../../components/ui/button'
import { TextAreaField } from '../../../components/ui/text-area-field'
import { useAddIncidentNote } from '../api/use-incident-mutations'

/** A note on the record: how observers (veterinarian, welfare officer) add what they saw or advised. */
export function IncidentNoteForm({ incidentId }: { incidentId: number }) {
  const add = useAddIncidentNote(incidentId)
  const [text, setText] = useState('')
  const [error, setError] = useState<string | undefined>()
  return (
    <form
      noValidate
      aria-label="Add a note"
      onSubmit={(e) => {
        e.preventDefault()
        const parsed = IncidentNoteInputSchema.safeParse({ text })
        if (!parsed.success) return setError(parsed.error.issues[0].message)
        add.mutate(parsed.data.text, {
          onSuccess: () => {
            setText('')
            toast.success('Note added to the incident.')
          },
        })
      }}
      className="flex flex-col gap-2"
    >
      <TextAreaField
        label="Note"
        rows={3}
        value={text}
        error={error}
        onChange={(e) => {
          setText(e.target.value)
          setError(undefined)
        }}
      />
      <Button type="submit" variant="secondary" disabled={add.isPending} className="self-start">
        <MessageSquarePlus aria-hidden className="size-5" /> {add.isPending ? 'Adding…' : 'Add note'}
      </Button>
    </form>
  )
}
