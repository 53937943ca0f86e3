import { Plus, Trash2 } from 'lucide-react'
import { get, useFieldArray, type UseFormReturn } from 'react-hook-form'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import type { IncidentFormValues } from '../utils/incident-form'

/** Who was told and when; the first person told answers the welfare officer's deadline. */
export function ToldFields({ form, timeZone }: { form: UseFormReturn<IncidentFormValues>; timeZone: string }) {
  const told = useFieldArray({ control: form.control, name: 'told' })
  const error = (name: string) => (get(form.formState.errors, name) as { message?: string } | undefined)?.message
  return (
    <fieldset className="flex flex-col gap-2 sm:col-span-2">
      <legend className="text-sm font-semibold text-tide-800">Who was told and when (the welfare officer first)</legend>
      {told.fields.map((f, n) => (
        <div key={f.id} className="flex flex-wrap items-end gap-2">
          <Field label={`Person or body ${n + 1}`} className="min-w-48 flex-1" error={error(`told.${n}.who`)} {...form.register(`told.${n}.who`)} />
          <Field label="Told at" type="datetime-local" hint={timeZone} error={error(`told.${n}.at`)} {...form.register(`told.${n}.at`)} />
          <Button type="button" variant="ghost" aria-label={`Remove person ${n + 1}`} onClick={() => told.remove(n)}>
            <Trash2 aria-hidden className="size-5" />
          </Button>
        </div>
      ))}
      <Button type="button" variant="secondary" className="self-start" onClick={() => told.append({ who: '', at: '' })}>
        <Plus aria-hidden className="size-5" /> Add who was told
      </Button>
    </fieldset>
  )
}
