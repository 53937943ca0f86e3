import { CircleAlert, CircleCheck, Save } from 'lucide-react'
import { useState, type FormEvent } from 'react'
import type { RoundTask } from '#shared/schemas/round'
import { Button } from '../../../components/ui/button'
import { ApiError } from '../../../lib/api-client'
import { useEnterPaperCompletion } from '../api/use-enter-paper-completion'
import { isFinished } from '../utils/group-by-area'
import { checkPaperDraft, refusal, serverFieldErrors, type PaperDraft } from '../utils/paper-form'
import { clockTime } from '../utils/sheet-format'
import { PaperPersonTime } from './paper-person-time'
import { PaperReadingField } from './paper-reading-field'
import { PaperResult } from './paper-result'

interface PaperTaskFormProps {
  task: RoundTask
  date: string
  timeZone: string
  people: Array<{ id: number; name: string }>
  defaultPersonId: number | null
}

/** One task of a paper sheet, typed in on its own: readings, the paper's time and who did it. */
export function PaperTaskForm({ task, date, timeZone, people, defaultPersonId }: PaperTaskFormProps) {
  const enter = useEnterPaperCompletion()
  const [completionId] = useState(() => crypto.randomUUID())
  const [draft, setDraft] = useState<PaperDraft>({ values: {}, time: '', personId: task.assigneeId ?? defaultPersonId })
  const [errors, setErrors] = useState<Record<string, string>>({})
  const apiError = enter.error instanceof ApiError ? enter.error : null
  const shownErrors = { ...serverFieldErrors(apiError?.fieldErrors), ...errors }

  const submit = (e: FormEvent) => {
    e.preventDefault()
    const check = checkPaperDraft(task, draft, date, timeZone)
    if (!check.ok) return setErrors(check.errors)
    setErrors({})
    enter.mutate({ taskId: task.id, completionId, readings: check.readings, doneAt: check.doneAt, performedById: check.personId })
  }

  const heading = (
    <h3 className="flex flex-wrap items-baseline gap-x-3 font-bold text-tide-900">
      <span className="tabular-nums">{task.localTime}</span> {task.targetLabel} <span className="font-normal">{task.title}</span>
    </h3>
  )
  if (enter.data)
    return (
      <li className="flex flex-col gap-2 rounded-xl border border-tide-200 bg-white p-3">
        {heading}
        <PaperResult result={enter.data} specs={task.readingSpecs} timeZone={timeZone} />
      </li>
    )
  if (isFinished(task)) {
    return (
      <li className="flex flex-col gap-1 rounded-xl border border-tide-200 bg-white p-3">
        {heading}
        <p className="flex items-center gap-1.5 text-sm text-tide-700">
          <CircleCheck aria-hidden className="size-4" /> Already {task.status} in Roundtide{task.completedAt && ` at ${clockTime(task.completedAt, timeZone)}`}
          {task.completedByName && ` by ${task.completedByName}`}
        </p>
      </li>
    )
  }
  return (
    <li className="rounded-xl border border-tide-200 bg-white p-3">
      <form aria-label={`${task.localTime} ${task.targetLabel} ${task.title}`} onSubmit={submit} noValidate className="flex flex-col gap-3">
        {heading}
        {task.readingSpecs.length > 0 && (
          <div className="grid grid-cols-[repeat(auto-fill,minmax(11rem,1fr))] gap-3">
            {task.readingSpecs.map((spec) => (
              <PaperReadingField
                key={spec.key}
                spec={spec}
                value={draft.values[spec.key] ?? ''}
                error={shownErrors[spec.key]}
                onChange={(v) => setDraft((d) => ({ ...d, values: { ...d.values, [spec.key]: v } }))}
              />
            ))}
          </div>
        )}
        <PaperPersonTime draft={draft} people={people} errors={shownErrors} onChange={(change) => setDraft((d) => ({ ...d, ...change }))} />
        {enter.isError && (
          <p role="alert" className="flex items-center gap-1.5 text-sm font-semibold text-alarm-700">
            <CircleAlert aria-hidden className="size-4" /> Not saved: {refusal(enter.error, timeZone)}
          </p>
        )}
        <Button type="submit" variant="secondary" disabled={enter.isPending} className="self-start">
          <Save aria-hidden className="size-4" /> {enter.isPending ? 'Saving…' : 'Save this task'}
        </Button>
      </form>
    </li>
  )
}
