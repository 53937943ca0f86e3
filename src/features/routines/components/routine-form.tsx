import { zodResolver } from '@hookform/resolvers/zod'
import { useQueryClient } from '@tanstack/react-query'
import { CircleAlert, Save } from 'lucide-react'
import { useMemo, useState, type ReactNode } from 'react'
import { FormProvider, useForm, type FieldPath } from 'react-hook-form'
import { toast } from 'sonner'
import type { Parameter } from '#shared/schemas/parameter'
import type { Routine, RoutineData, RoutineInput } from '#shared/schemas/routine'
import { Button } from '../../../components/ui/button'
import { ApiError } from '../../../lib/api-client'
import { routineQueries } from '../api/routine-queries'
import { useCreateRoutine } from '../api/use-create-routine'
import { useUpdateRoutine } from '../api/use-update-routine'
import { routineFormSchema } from '../utils/routine-form-schema'
import { newRoutineValues, routineValues } from '../utils/routine-form-values'
import { ActivePeriodFields } from './active-period-fields'
import { AssigneePicker } from './assignee-picker'
import { FormSection } from './form-section'
import { ReadingPicker } from './reading-picker'
import { RoutineBasicsFields } from './routine-basics-fields'
import { RoutineConflictNotice } from './routine-conflict-notice'
import { RuleEditor } from './rule-editor'
import { RulePreviewPanel } from './rule-preview-panel'
import { TargetPicker } from './target-picker'
import { TimingFields } from './timing-fields'

type Props = {
  routine?: Routine
  timeZone: string
  parameters: Parameter[]
  canEdit: boolean
  canPickPerson: boolean
  onCreated: (routine: Routine) => void
  /** Extra actions beside Save, such as Delete. */
  actions?: ReactNode
}

export function RoutineForm({ routine, timeZone, parameters, canEdit, canPickPerson, onCreated, actions }: Props) {
  const create = useCreateRoutine()
  const update = useUpdateRoutine()
  const queryClient = useQueryClient()
  // The version this form's edits are based on; a background refetch must not move it, or a
  // stale save would silently overwrite someone else's change instead of getting a 409.
  const [base, setBase] = useState(routine)
  const [generation, setGeneration] = useState(0)
  const [conflict, setConflict] = useState(false)
  const [reloading, setReloading] = useState(false)
  const schema = useMemo(() => routineFormSchema(timeZone), [timeZone])
  const form = useForm<RoutineInput, unknown, RoutineData>({
    resolver: zodResolver(schema),
    defaultValues: routine ? routineValues(routine) : newRoutineValues(timeZone),
  })

  function adopt(latest: Routine) {
    setBase(latest)
    form.reset(routineValues(latest))
    setGeneration((g) => g + 1)
    setConflict(false)
  }

  function showServerErrors(error: Error) {
    if (!(error instanceof ApiError)) return
    if (error.status === 409) return setConflict(true)
    if (error.code !== 'validation_failed') return
    for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) {
      form.setError(field as FieldPath<RoutineInput>, { message: messages[0] })
    }
    form.setError('root.server', { message: error.message })
  }

  const submit = form.handleSubmit((data) => {
    if (!base) {
      create.mutate(data, {
        onSuccess: (saved) => {
          toast.success(`Saved “${saved.name}”; its tasks are planned for the next six weeks.`)
          onCreated(saved)
        },
        onError: showServerErrors,
      })
      return
    }
    update.mutate(
      { id: base.id, input: { ...data, version: base.version } },
      {
        onSuccess: (saved) => {
          toast.success(`Saved “${saved.name}”; its future tasks were planned again.`)
          adopt(saved)
        },
        onError: showServerErrors,
      },
    )
  })

  async function reload() {
    if (!base) return
    setReloading(true)
    try {
      adopt(await queryClient.fetchQuery({ ...routineQueries.detail(base.id), staleTime: 0 }))
    } finally {
      setReloading(false)
    }
  }

  const saving = create.isPending || update.isPending
  const errors = form.formState.errors
  const hasErrors = Object.keys(errors).length > 0

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit} aria-label={base ? `Edit ${base.name}` : 'New routine'} className="flex flex-col gap-4">
        <fieldset disabled={!canEdit} className="flex min-w-0 flex-col gap-4">
          <RoutineBasicsFields />
          <TargetPicker />
          <FormSection title="When" description={`Times are facility time (${timeZone}).`} className="lg:grid-cols-2 lg:gap-6">
            <RuleEditor key={generation} />
            <RulePreviewPanel timeZone={timeZone} />
            <div className="lg:col-span-2">
              <TimingFields />
            </div>
          </FormSection>
          <AssigneePicker canPickPerson={canPickPerson} />
          <ReadingPicker parameters={parameters} />
          <ActivePeriodFields />
        </fieldset>
        {/* next to Save, where the person is looking when it fails */}
        {conflict && <RoutineConflictNotice onReload={reload} reloading={reloading} />}
        {hasErrors && form.formState.isSubmitted && (
          <p role="alert" className="flex items-start gap-2 font-semibold text-alarm-700">
            <CircleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
            {errors.root?.server?.message ?? 'Some fields need attention; see the messages above.'}
          </p>
        )}
        {canEdit && (
          <div className="flex flex-col gap-3 sm:flex-row sm:items-center sm:justify-between">
            <Button type="submit" disabled={saving}>
              <Save aria-hidden className="size-5" /> {saving ? 'Saving…' : base ? 'Save changes' : 'Save routine'}
            </Button>
            {actions}
          </div>
        )}
      </form>
    </FormProvider>
  )
}
