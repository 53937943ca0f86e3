import { zodResolver } from '@hookform/resolvers/zod'
import { Play } from 'lucide-react'
import { FormProvider, useForm, type FieldPath } from 'react-hook-form'
import type { Area, Batch, Tank } from '#shared/schemas/facility'
import { FASTING_KINDS, type EventInput, type FacilityEvent, type Playbook } from '#shared/schemas/playbook'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import { useStartEvent } from '../api/use-event-mutations'
import { defaultEventValues, eventFormSchema, LOCAL_START, type EventFormValues } from '../utils/event-form'
import { EventTargetFields } from './event-target-fields'
import { EventTaskPreview } from './event-task-preview'
import { FastingCaution } from './fasting-caution'
import { SelectField } from '../../../components/ui/select-field'
import { TextAreaField } from '../../../components/ui/text-area-field'

type Props = {
  playbooks: Playbook[]
  tanks: Tank[]
  areas: Area[]
  batches: Batch[]
  zone: string
  onStarted: (event: FacilityEvent) => void
  onClose: () => void
}

export function StartEventForm({ playbooks, tanks, areas, batches, zone, onStarted, onClose }: Props) {
  const start = useStartEvent()
  const form = useForm<EventFormValues, unknown, EventInput>({ resolver: zodResolver(eventFormSchema), defaultValues: defaultEventValues(zone) })
  const {
    register,
    watch,
    setValue,
    getValues,
    formState: { errors },
  } = form
  const values = watch()
  const playbook = playbooks.find((p) => String(p.id) === values.playbookId) ?? null
  const fasts = !!playbook && FASTING_KINDS.includes(playbook.kind)
  const batch = batches.find((b) => String(b.id) === values.batchId)
  const tankCount = values.target === 'tanks' ? values.tankIds.length : (batch?.tankIds.length ?? 0)
  const fastingHours = values.fastingHours === '' ? (playbook?.fastingHours ?? 0) : Number(values.fastingHours)

  const pickPlaybook = (id: string) => {
    const previous = playbooks.find((p) => String(p.id) === getValues('playbookId'))
    const next = playbooks.find((p) => String(p.id) === id)
    if (!getValues('title') || getValues('title') === previous?.name) setValue('title', next?.name ?? '')
    setValue('fastingHours', next && FASTING_KINDS.includes(next.kind) ? String(next.fastingHours) : '')
  }

  const submit = form.handleSubmit((input) =>
    start.mutate(input, {
      onSuccess: onStarted,
      onError: (error) => {
        if (!(error instanceof ApiError) || error.code !== 'validation_failed') return
        for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) form.setError(field as FieldPath<EventFormValues>, { message: messages[0] })
      },
    }),
  )

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit} aria-label="Start event" className="flex flex-col gap-4 rounded-xl border border-tide-300 bg-white p-4 md:p-5">
        <h3 className="text-lg font-bold text-tide-900">Start an event</h3>
        <div className="grid gap-4 md:grid-cols-2">
          <SelectField label="Playbook" error={errors.playbookId?.message} {...register('playbookId', { onChange: (e) => pickPlaybook(e.target.value) })}>
            <option value="">Choose a playbook</option>
            {playbooks.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </SelectField>
          <Field label="Title" error={errors.title?.message} {...register('title')} />
          <Field label="Starts (facility time)" type="datetime-local" hint={zone} error={errors.localStart?.message} {...register('localStart')} />
          {fasts && (
            <Field
              label="Fasting before (hours)"
              type="number"
              inputMode="numeric"
              min={0}
              max={168}
              error={errors.fastingHours?.message}
              hint="Feeding tasks of these tanks are held, not missed."
              {...register('fastingHours')}
            />
          )}
        </div>
        {fasts && <FastingCaution />}
        <EventTargetFields tanks={tanks} areas={areas} batches={batches} />
        <TextAreaField label="Notes" {...register('notes')} />
        {playbook && LOCAL_START.test(values.localStart) && (
          <EventTaskPreview playbook={playbook} localStart={values.localStart} zone={zone} tankCount={tankCount} fastingHours={fastingHours} />
        )}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={start.isPending}>
            <Play aria-hidden className="size-5" /> {start.isPending ? 'Starting…' : 'Start event'}
          </Button>
          <Button type="button" variant="ghost" onClick={onClose}>
            Close
          </Button>
        </div>
      </form>
    </FormProvider>
  )
}
