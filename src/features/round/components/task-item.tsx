import { clsx } from 'clsx'
import { ChevronDown, CirclePause, CloudUpload, RotateCcw, Scale } from 'lucide-react'
import { useEffect, useRef } from 'react'
import type { Round, RoundTask } from '#shared/schemas/round'
import type { SubmitOutcome } from '../api/use-submit-completion'
import type { OutboxEntry } from '../outbox/outbox-store'
import { useCompletionResult } from '../state/result-store'
import { isFinished } from '../utils/group-round'
import { BandBadge } from '../../../components/ui/band-badge'
import { CompletedDetails } from './completed-details'
import { OutboxNotice } from './outbox-notice'
import { TakeButton } from './take-button'
import { TaskForm } from './task-form'
import { TaskStatusBadge } from './task-status-badge'

interface Props {
  task: RoundTask
  round: Round
  personId: number
  online: boolean
  expanded: boolean
  advancedTo: boolean
  entry?: OutboxEntry
  onToggle: () => void
  onFinished: (taskId: number, outcome: SubmitOutcome) => void
}

/** One task on the round: a large row to open it, and when open, what it needs. */
export function TaskItem({ task, round, personId, online, expanded, advancedTo, entry, onToggle, onFinished }: Props) {
  const result = useCompletionResult(task.id)
  const ref = useRef<HTMLLIElement>(null)
  const finished = isFinished(task)
  const late = task.status === 'overdue' || task.status === 'missed'
  const recheck = task.flag ? round.tasks.find((t) => t.recheckOfTaskId === task.id) : undefined

  useEffect(() => {
    if (advancedTo) ref.current?.scrollIntoView({ block: 'start', behavior: 'smooth' })
  }, [advancedTo])

  return (
    <li
      ref={ref}
      className={clsx(
        'scroll-mt-36 rounded-2xl bg-white shadow-sm ring-1',
        task.status === 'missed' ? 'ring-2 ring-alarm-500' : task.status === 'overdue' ? 'ring-2 ring-ember-500' : 'ring-tide-200',
      )}
    >
      <button type="button" aria-expanded={expanded} onClick={onToggle} className="flex min-h-16 w-full items-center gap-3 p-3 text-left">
        <span className={clsx('w-14 shrink-0 text-lg font-bold tabular-nums', late ? 'text-alarm-700' : finished ? 'text-tide-500' : 'text-tide-900')}>
          {task.localTime}
        </span>
        <span className="flex min-w-0 flex-1 flex-col gap-1">
          <span className={clsx('font-semibold', finished ? 'text-tide-600' : 'text-tide-950')}>
            {task.recheckOfTaskId && <RotateCcw aria-hidden className="mr-1 inline size-4 align-[-2px]" />}
            {task.title}
          </span>
          <span className="flex flex-wrap items-center gap-1.5">
            <TaskStatusBadge status={task.status} />
            {task.flag && <BandBadge band={task.flag} prefix="Flag" ringed />}
            {entry && !entry.failure && (
              <span className="inline-flex items-center gap-1 rounded-md bg-tide-100 px-1.5 py-0.5 text-sm font-semibold text-tide-800">
                <CloudUpload aria-hidden className="size-4" /> Waiting to send
              </span>
            )}
            {entry?.failure && <span className="rounded-md bg-alarm-100 px-1.5 py-0.5 text-sm font-bold text-alarm-700">Not sent</span>}
          </span>
          {recheck && !expanded && (
            <span className="flex items-center gap-1 text-sm font-semibold text-tide-800">
              <RotateCcw aria-hidden className="size-4" /> Recheck due at {recheck.localTime}
            </span>
          )}
        </span>
        <ChevronDown aria-hidden className={clsx('size-6 shrink-0 text-tide-500 transition-transform', expanded && 'rotate-180')} />
      </button>
      {task.assigneeId === null && !finished && (
        <div className="px-3 pb-3">
          <TakeButton taskId={task.id} personId={personId} />
        </div>
      )}
      {expanded && (
        <div className="flex flex-col gap-4 border-t border-tide-100 p-3">
          {task.instructions && <p className="whitespace-pre-line text-tide-800">{task.instructions}</p>}
          {task.rationG != null && (
            <p className="flex flex-wrap items-center gap-x-2 font-semibold text-tide-900">
              <Scale aria-hidden className="size-5 shrink-0 text-tide-600" /> Ration: {task.rationG} g
              <span className="font-normal text-tide-600">from the batch's biomass and feeding rate</span>
            </p>
          )}
          {entry && <OutboxNotice entry={entry} round={round} />}
          {task.status === 'held' ? (
            <p className="flex items-center gap-2 text-tide-800">
              <CirclePause aria-hidden className="size-5" /> On hold: {task.heldReason ?? 'a fasting window'}
            </p>
          ) : finished ? (
            <CompletedDetails task={task} round={round} result={result} />
          ) : entry ? null : (
            <TaskForm task={task} personId={personId} online={online} onFinished={onFinished} />
          )}
        </div>
      )}
    </li>
  )
}
