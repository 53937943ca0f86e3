import { Save } from 'lucide-react'
import { get, useForm, type FieldPath } from 'react-hook-form'
import { toast } from 'sonner'
import type { Incident } from '#shared/schemas/incident'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { SelectField } from '../../../components/ui/select-field'
import { TextAreaField } from '../../../components/ui/text-area-field'
import { ApiError } from '../../../lib/api-client'
import { useUpdateIncident } from '../api/use-incident-mutations'
import { checkIncidentForm, incidentFormValues, type IncidentFormValues } from '../utils/incident-form'
import { ChooseSeveral, type Option } from './choose-several'
import { ToldFields } from './told-fields'

interface Props {
  incident: Incident
  timeZone: string
  tanks: Option[]
  batches: Option[]
  people: Option[]
  onDone: () => void
}

const NEXT_STATUSES: Record<Incident['status'], Array<IncidentFormValues['status']>> = {
  proposed: [],
  dismissed: [],
  open: ['open', 'reported', 'closed'],
  reported: ['reported', 'closed'],
  closed: ['closed'],
}
const STATUS_WORDS = { open: 'Open', reported: 'Reported to the ethics committee', closed: 'Closed: full report done' }

/** The record a committee reads: what happened, who and what was involved, who was told, causes and actions, status. */
export function IncidentEditForm({ incident, timeZone, tanks, batches, people, onDone }: Props) {
  const form = useForm<IncidentFormValues>({ defaultValues: incidentFormValues(incident, timeZone) })
  const update = useUpdateIncident(incident.id)
  const { register } = form
  const error = (name: string) => (get(form.formState.errors, name) as { message?: string } | undefined)?.message
  const setErrors = (errors: Record<string, string | string[]>) => {
    for (const [field, m] of Object.entries(errors)) form.setError(field as FieldPath<IncidentFormValues>, { message: Array.isArray(m) ? m[0] : m })
  }
  const submit = form.handleSubmit((values) => {
    const check = checkIncidentForm(values, incident.status, timeZone)
    if (!check.ok) return setErrors(check.errors)
    update.mutate(check.input, {
      onSuccess: () => {
        toast.success('Incident record saved.')
        onDone()
      },
      onError: (e) => {
        if (e instanceof ApiError && e.fieldErrors) setErrors(e.fieldErrors)
      },
    })
  })
  const multi = (label: string, name: 'tankIds' | 'batchIds' | 'personIds', options: Option[]) => (
    <ChooseSeveral label={label} options={options} error={error(name)} registration={register(name)} />
  )
  return (
    <form noValidate aria-label="Incident record" onSubmit={submit} className="grid gap-3 rounded-xl border border-tide-200 bg-white p-4 sm:grid-cols-2">
      <Field label="Title" className="sm:col-span-2" error={error('title')} {...register('title')} />
      <TextAreaField label="What happened" rows={3} className="sm:col-span-2" error={error('whatHappened')} {...register('whatHappened')} />
      <Field label="Started" type="datetime-local" hint={timeZone} error={error('startedAt')} {...register('startedAt')} />
      <Field label="Noticed" type="datetime-local" hint={timeZone} error={error('noticedAt')} {...register('noticedAt')} />
      {multi('Tanks', 'tankIds', tanks)}
      {multi('Batches', 'batchIds', batches)}
      {multi('People involved', 'personIds', people)}
      <div className="grid grid-cols-2 gap-3">
        <Field label="Animals affected" inputMode="numeric" error={error('affected')} {...register('affected')} />
        <Field label="Animals dead" inputMode="numeric" error={error('dead')} {...register('dead')} />
      </div>
      <TextAreaField label="Immediate actions" rows={3} className="sm:col-span-2" error={error('immediateActions')} {...register('immediateActions')} />
      <ToldFields form={form} timeZone={timeZone} />
      <TextAreaField label="Root cause" rows={3} error={error('rootCause')} {...register('rootCause')} />
      <TextAreaField label="Corrective actions" rows={3} error={error('correctiveActions')} {...register('correctiveActions')} />
      <SelectField label="Status" error={error('status')} {...register('status')}>
        {NEXT_STATUSES[incident.status].map((s) => (
          <option key={s} value={s}>
            {STATUS_WORDS[s]}
          </option>
        ))}
      </SelectField>
      <div className="flex flex-wrap items-end gap-2 sm:col-span-2">
        <Button type="submit" disabled={update.isPending}>
          <Save aria-hidden className="size-5" /> {update.isPending ? 'Saving…' : 'Save the record'}
        </Button>
        <Button type="button" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  )
}
