import { useQueryClient } from '@tanstack/react-query'
import { Check, CircleAlert, Loader2, NotebookPen, X } from 'lucide-react'
import { Fragment, useEffect, useRef } from 'react'
import type { RoundTask } from '#shared/schemas/round'
import { MORTALITY_READING } from '#shared/schemas/stock'
import { taskKeys } from '../../../api/tasks/task-keys'
import { ApiError } from '../../../lib/api-client'
import { useSubmitCompletion, type SubmitOutcome } from '../api/use-submit-completion'
import { useDraft } from '../state/drafts'
import { buildCompletion, draftErrorsFrom } from '../utils/build-completion'
import { DerivedReadings } from './derived-readings'
import { MortalityDetail, useTankCount } from './mortality-detail'
import { PhotoPicker } from './photo-picker'
import { ReadingInput } from './reading-input'
import { SkipForm } from './skip-form'

interface Props {
  task: RoundTask
  personId: number
  online: boolean
  onFinished: (taskId: number, outcome: SubmitOutcome) => void
}

const without = (errors: Record<string, string>, key: string) => Object.fromEntries(Object.entries(errors).filter(([k]) => k !== key && k !== 'form'))

const big = 'inline-flex min-h-14 items-center justify-center gap-2 rounded-xl px-5 text-lg font-bold disabled:opacity-60'

export function TaskForm({ task, personId, online, onFinished }: Props) {
  const { draft, update, clear } = useDraft(task.id)
  const submit = useSubmitCompletion(personId)
  const queryClient = useQueryClient()
  const inputs = useRef<Array<HTMLInputElement | null>>([])
  const countsDead = task.readingSpecs.some((s) => s.key === MORTALITY_READING)
  const inTank = useTankCount(task.tankId, countsDead)
  const dead = Number((draft.readings[MORTALITY_READING] ?? '').replace(',', '.'))

  // Opening a task puts the cursor in its first reading: tap to open, type, tap Done.
  useEffect(() => {
    inputs.current[0]?.focus({ preventScroll: true })
  }, [])

  const send = (outcome: 'done' | 'skipped') => {
    const built = buildCompletion(task, draft, outcome)
    if (!built.ok) {
      update({ errors: built.errors })
      const firstBad = task.readingSpecs.findIndex((s) => built.errors[`readings.${s.key}`])
      if (firstBad >= 0) inputs.current[firstBad]?.focus()
      return
    }
    update({ errors: {} })
    // mutateAsync, not mutate: the form unmounts as soon as the cache or the outbox shows the task finished.
    submit.mutateAsync({ task, payload: built.payload }).then(
      (outcome) => {
        clear()
        onFinished(task.id, outcome)
      },
      (error: Error) => {
        update({ errors: draftErrorsFrom(error instanceof ApiError ? error.fieldErrors : undefined, error.message) })
        if (error instanceof ApiError && error.status === 409) void queryClient.invalidateQueries({ queryKey: taskKeys.rounds() })
      },
    )
  }

  const formError = draft.errors.form && (
    <p role="alert" className="flex items-start gap-2 rounded-xl bg-alarm-50 p-3 font-semibold text-alarm-700">
      <CircleAlert aria-hidden className="mt-0.5 size-5 shrink-0" /> {draft.errors.form}
    </p>
  )

  if (draft.mode === 'skip') {
    return (
      <div className="flex flex-col gap-4">
        <SkipForm draft={draft} onChange={update} />
        {formError}
        <div className="flex gap-2">
          <button type="button" disabled={submit.isPending} onClick={() => send('skipped')} className={`${big} flex-1 bg-tide-800 text-white`}>
            {submit.isPending ? <Loader2 aria-hidden className="size-5 animate-spin" /> : <X aria-hidden className="size-5" />} Mark as can't do
          </button>
          <button type="button" onClick={() => update({ mode: 'done', errors: {} })} className={`${big} text-tide-700 ring-1 ring-tide-200`}>
            Back
          </button>
        </div>
      </div>
    )
  }

  return (
    <form
      noValidate
      onSubmit={(e) => {
        e.preventDefault()
        send('done')
      }}
      className="flex flex-col gap-4"
    >
      {task.readingSpecs.map((spec, i) => (
        <Fragment key={spec.key}>
          <ReadingInput
            ref={(el) => {
              inputs.current[i] = el
            }}
            spec={spec}
            aside={spec.key === MORTALITY_READING && inTank !== null ? `${inTank.toLocaleString('en-GB')} fish in this tank on the register` : undefined}
            value={draft.readings[spec.key] ?? ''}
            error={draft.errors[`readings.${spec.key}`]}
            last={i === task.readingSpecs.length - 1}
            onChange={(value) => update((d) => ({ readings: { ...d.readings, [spec.key]: value }, errors: without(d.errors, `readings.${spec.key}`) }))}
            onEnter={() => (i < task.readingSpecs.length - 1 ? inputs.current[i + 1]?.focus() : send('done'))}
          />
          {spec.key === MORTALITY_READING && dead > 0 && (
            <MortalityDetail
              value={draft.mortality}
              errors={draft.errors}
              onChange={(patch) =>
                update((d) => ({ mortality: { ...d.mortality, ...patch }, errors: without(without(d.errors, 'mortality.cause'), 'mortality.causeText') }))
              }
            />
          )}
        </Fragment>
      ))}
      <DerivedReadings specs={task.readingSpecs} raw={draft.readings} salinitySetpoint={task.salinitySetpoint} />
      {draft.noteOpen ? (
        <label className="flex flex-col gap-1 font-semibold text-tide-900">
          Note
          <textarea
            rows={2}
            value={draft.note}
            onChange={(e) => update({ note: e.target.value })}
            className="rounded-xl border-2 border-tide-200 bg-white p-3 text-base font-normal focus:border-tide-500 focus:outline-none"
          />
        </label>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {!draft.noteOpen && (
          <button
            type="button"
            onClick={() => update({ noteOpen: true })}
            className="inline-flex min-h-12 items-center gap-2 rounded-xl px-3 font-semibold text-tide-700 ring-1 ring-tide-200 hover:bg-tide-50"
          >
            <NotebookPen aria-hidden className="size-5" /> Add note
          </button>
        )}
        <PhotoPicker taskId={task.id} online={online} />
      </div>
      {formError}
      <div className="flex gap-2">
        <button type="submit" disabled={submit.isPending} className={`${big} flex-1 bg-tide-700 text-white hover:bg-tide-800`}>
          {submit.isPending ? <Loader2 aria-hidden className="size-5 animate-spin" /> : <Check aria-hidden className="size-6" />} Done
        </button>
        <button type="button" onClick={() => update({ mode: 'skip', errors: {} })} className={`${big} text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50`}>
          Can't do
        </button>
      </div>
    </form>
  )
}
