import { zodResolver } from '@hookform/resolvers/zod'
import { useForm, type DefaultValues, type FieldPath, type FieldValues } from 'react-hook-form'
import { toast } from 'sonner'
import type { z } from 'zod'
import type { BathRecordSchema, BatchRecord, NoteRecordSchema, TransportBoxRecordSchema, TransportWaterRecordSchema } from '#shared/schemas/batch-record'
import { ApiError } from '../../../lib/api-client'
import { useAddRecord } from '../api/use-add-record'

type RecordData = z.input<typeof TransportBoxRecordSchema | typeof TransportWaterRecordSchema | typeof BathRecordSchema | typeof NoteRecordSchema>

type Options<V extends FieldValues> = {
  batchId: number
  eventId: number | null
  defaultValues: DefaultValues<V>
  saved: (record: BatchRecord) => string
  /** The values to start the next entry with, e.g. the next box number. */
  next?: (values: V) => DefaultValues<V>
}

/** A record form whose inputs are strings, checked by `schema` and posted with the event it belongs to. */
export function useRecordForm<V extends FieldValues, Out extends RecordData>(schema: z.ZodType<Out, V>, options: Options<V>) {
  const add = useAddRecord(options.batchId)
  const form = useForm<V, unknown, Out>({ resolver: zodResolver(schema), defaultValues: options.defaultValues })

  const submit = form.handleSubmit((out) =>
    add.mutate(
      { ...out, eventId: options.eventId },
      {
        onSuccess: (record) => {
          toast.success(options.saved(record))
          form.reset(options.next ? options.next(form.getValues()) : options.defaultValues)
        },
        onError: (error) => {
          if (!(error instanceof ApiError) || error.code !== 'validation_failed') return
          for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) form.setError(field as FieldPath<V>, { message: messages[0] })
        },
      },
    ),
  )
  return { form, submit, saving: add.isPending }
}
