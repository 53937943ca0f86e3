import { Save } from 'lucide-react'
import { useState } from 'react'
import { useForm, type FieldPath } from 'react-hook-form'
import { toast } from 'sonner'
import type { Role } from '#shared/schemas/person'
import { MOVEMENT_KINDS, MOVEMENT_KIND_LABELS, TECHNICIAN_MOVEMENT_KINDS, type Movement } from '#shared/schemas/stock'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { FormRefusal } from '../../../components/ui/form-refusal'
import { SelectField } from '../../../components/ui/select-field'
import { ApiError } from '../../../lib/api-client'
import { useRecordMovement } from '../api/use-record-movement'
import { checkMovementForm, emptyMovementForm, type MovementFormValues } from '../utils/movement-form'
import { MovementFields, type Choice } from './movement-fields'

interface Props {
  role: Role
  timeZone: string
  /** The batches to choose from; one batch means the form is on that batch's page. */
  batches: Choice[]
  tanks: Choice[]
  causes: string[]
  movements: Movement[]
  start: Partial<MovementFormValues>
  onRecorded?: () => void
}

/**
 * Records one movement. A refusal (a count the register cannot hold) shows the server's words
 * beside the field and keeps everything typed, so the person fixes one number and saves again.
 */
export function MovementForm({ role, timeZone, batches, tanks, causes, movements, start, onRecorded }: Props) {
  const kinds = role === 'technician' ? MOVEMENT_KINDS.filter((k) => TECHNICIAN_MOVEMENT_KINDS.includes(k)) : MOVEMENT_KINDS
  const form = useForm<MovementFormValues>({ defaultValues: emptyMovementForm(start) })
  const record = useRecordMovement()
  const [refusal, setRefusal] = useState<string | null>(null)
  const batchId = Number(form.watch('batchId'))

  const submit = form.handleSubmit((values) => {
    setRefusal(null)
    form.clearErrors()
    const check = checkMovementForm(values, timeZone)
    if (!check.ok) {
      for (const [field, message] of Object.entries(check.errors)) form.setError(field as FieldPath<MovementFormValues>, { message })
      return
    }
    record.mutate(check.input, {
      onSuccess: (saved) => {
        toast.success(`Recorded: ${MOVEMENT_KIND_LABELS[saved.kind].toLowerCase()}, ${saved.count} fish (#${saved.id}).`)
        form.reset(emptyMovementForm({ ...start, kind: values.kind, batchId: values.batchId }))
        onRecorded?.()
      },
      onError: (error) => {
        if (!(error instanceof ApiError) || error.code !== 'validation_failed') return
        setRefusal(error.message)
        for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) form.setError(field as FieldPath<MovementFormValues>, { message: messages[0] })
      },
    })
  })

  return (
    <form noValidate onSubmit={submit} aria-label="Record a movement" className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="What happened" {...form.register('kind')}>
          {kinds.map((k) => (
            <option key={k} value={k}>
              {MOVEMENT_KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
        {batches.length > 1 && (
          <SelectField label="Batch" error={form.formState.errors.batchId?.message} {...form.register('batchId')}>
            <option value="">Choose a batch…</option>
            {batches.map((b) => (
              <option key={b.id} value={b.id}>
                {b.label}
              </option>
            ))}
          </SelectField>
        )}
      </div>
      <MovementFields form={form} tanks={tanks} causes={causes} correctable={movements.filter((m) => m.batchId === batchId)} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field
          label="When (facility time; empty for now)"
          type="datetime-local"
          hint={timeZone}
          error={form.formState.errors.occurredAt?.message}
          {...form.register('occurredAt')}
        />
        <Field label="Note (optional)" error={form.formState.errors.note?.message} {...form.register('note')} />
      </div>
      <FormRefusal message={refusal} />
      <Button type="submit" disabled={record.isPending} className="w-full sm:w-auto sm:self-start">
        <Save aria-hidden className="size-5" /> {record.isPending ? 'Saving…' : 'Record movement'}
      </Button>
    </form>
  )
}
