import { FilePlus2, WifiOff } from 'lucide-react'
import { useState } from 'react'
import { get, useForm, type FieldPath } from 'react-hook-form'
import type { Incident } from '#shared/schemas/incident'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { FormRefusal } from '../../../components/ui/form-refusal'
import { TextAreaField } from '../../../components/ui/text-area-field'
import { ApiError } from '../../../lib/api-client'
import { useOnline } from '../../../lib/use-online'
import { useFileIncident } from '../api/use-incident-mutations'
import { checkFileIncidentForm, emptyFileIncidentForm, type FileIncidentFormValues } from '../utils/file-incident-form'
import { ChooseSeveral, type Option } from './choose-several'

interface Props {
  timeZone: string
  tanks: Option[]
  batches: Option[]
  /** A technician's incident waits for a supervisor's decision; say so before they send it. */
  needsReview: boolean
  onFiled: (incident: Incident) => void
}

/**
 * Files what Roundtide cannot see. Checked with the server's schema before sending; a refusal
 * (or no connection) shows beside the fields and keeps everything typed, so nothing is typed twice.
 */
export function FileIncidentForm({ timeZone, tanks, batches, needsReview, onFiled }: Props) {
  const form = useForm<FileIncidentFormValues>({ defaultValues: emptyFileIncidentForm(timeZone) })
  const file = useFileIncident()
  const online = useOnline()
  const [refusal, setRefusal] = useState<string | null>(null)
  const { register } = form
  const error = (name: string) => (get(form.formState.errors, name) as { message?: string } | undefined)?.message
  const setErrors = (errors: Record<string, string | string[]>) => {
    for (const [field, m] of Object.entries(errors)) form.setError(field as FieldPath<FileIncidentFormValues>, { message: Array.isArray(m) ? m[0] : m })
  }

  const submit = form.handleSubmit((values) => {
    setRefusal(null)
    form.clearErrors()
    const check = checkFileIncidentForm(values, timeZone)
    if (!check.ok) return setErrors(check.errors)
    file.mutate(check.input, {
      onSuccess: onFiled,
      onError: (e) => {
        setRefusal(
          e instanceof ApiError && e.code === 'network'
            ? 'Not filed: no connection to Roundtide. What you typed is still here; file it again when the connection is back.'
            : e.message,
        )
        if (e instanceof ApiError && e.fieldErrors) setErrors(e.fieldErrors)
      },
    })
  })

  const multi = (label: string, name: 'tankIds' | 'batchIds', options: Option[]) => (
    <ChooseSeveral label={label} options={options} error={error(name)} registration={register(name)} />
  )
  return (
    <form
      noValidate
      aria-label="File an incident"
      onSubmit={submit}
      className="grid gap-3 rounded-xl border border-tide-200 bg-white p-4 sm:grid-cols-2 md:p-5"
    >
      <Field label="What happened, in a few words" placeholder="Escape from a tank" className="sm:col-span-2" error={error('title')} {...register('title')} />
      <TextAreaField label="Describe what happened" rows={3} className="sm:col-span-2" error={error('whatHappened')} {...register('whatHappened')} />
      <Field label="Started (best estimate)" type="datetime-local" hint={timeZone} error={error('startedAt')} {...register('startedAt')} />
      <Field label="Noticed" type="datetime-local" hint={`${timeZone}; the deadlines count from here`} error={error('noticedAt')} {...register('noticedAt')} />
      {multi('Tanks involved', 'tankIds', tanks)}
      {multi('Batches involved', 'batchIds', batches)}
      <div className="grid grid-cols-2 gap-3 sm:col-span-2 sm:max-w-md">
        <Field label="Animals affected" inputMode="numeric" hint="Lost, hurt or dead" error={error('affected')} {...register('affected')} />
        <Field label="Animals dead" inputMode="numeric" error={error('dead')} {...register('dead')} />
      </div>
      <TextAreaField label="Immediate actions" rows={3} className="sm:col-span-2" error={error('immediateActions')} {...register('immediateActions')} />
      {needsReview && (
        <p className="text-sm text-tide-700 sm:col-span-2">
          A supervisor or manager confirms it before it is reported; the welfare officer’s deadline runs from now.
        </p>
      )}
      {!online && (
        <p role="status" className="flex items-start gap-2 rounded-xl bg-ember-50 p-3 font-semibold text-ember-700 sm:col-span-2">
          <WifiOff aria-hidden className="mt-0.5 size-5 shrink-0" /> You are offline. Keep typing; file it when the connection is back.
        </p>
      )}
      <FormRefusal message={refusal} className="sm:col-span-2" />
      <Button type="submit" disabled={file.isPending} className="w-full sm:col-span-2 sm:w-auto sm:justify-self-start">
        <FilePlus2 aria-hidden className="size-5" /> {file.isPending ? 'Filing…' : 'File the incident'}
      </Button>
    </form>
  )
}
