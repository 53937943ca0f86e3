import { useRecordForm } from '../hooks/use-record-form'
import { noteForm, type NoteValues } from '../utils/record-schemas'
import { FormCard } from './form-card'
import { TextAreaField } from '../../../components/ui/text-area-field'

/** A free note; a manager can file it as a review (e.g. clearing quarantine). */
export function NoteForm({ batchId, eventId, canReview }: { batchId: number; eventId: number | null; canReview: boolean }) {
  const empty: NoteValues = { kind: 'note', text: '' }
  const { form, submit, saving } = useRecordForm(noteForm, {
    batchId,
    eventId,
    defaultValues: empty,
    saved: (r) => (r.kind === 'review' ? 'Saved the review.' : 'Saved the note.'),
  })
  const {
    register,
    formState: { errors },
  } = form
  return (
    <FormCard title="Note" description="Behaviour, mortalities, what was done and why." onSubmit={submit} saving={saving} saveLabel="Save note">
      {canReview && (
        <div className="flex flex-wrap gap-2">
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" value="note" className="size-5" {...register('kind')} /> Note
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" value="review" className="size-5" {...register('kind')} /> Review
          </label>
        </div>
      )}
      <TextAreaField label="Text" rows={4} error={errors.text?.message} {...register('text')} />
    </FormCard>
  )
}
