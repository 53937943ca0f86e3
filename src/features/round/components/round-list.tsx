import { useDeferredValue } from 'react'
import type { Round } from '#shared/schemas/round'
import type { SubmitOutcome } from '../api/use-submit-completion'
import type { OutboxEntry } from '../outbox/outbox-store'
import { firstTasks, groupRound } from '../utils/group-round'
import { AreaSection } from './area-section'
import { TaskItem } from './task-item'

interface Props {
  round: Round
  personId: number
  online: boolean
  expandedId: number | null
  advancedTo: number | null
  outboxByTask: Map<number, OutboxEntry>
  onToggle: (taskId: number) => void
  onFinished: (taskId: number, outcome: SubmitOutcome) => void
}

// About what a phone shows before scrolling.
const FIRST_SCREEN_TASKS = 8

export function RoundList({ round, expandedId, advancedTo, outboxByTask, onToggle, ...rest }: Props) {
  // The list's first render draws the first screen only; the rest follows in React's background
  // pass, which yields to the browser every few milliseconds. Drawing a long round in one go kept a
  // slowed phone's main thread busy for hundreds of milliseconds right when the page appeared.
  const everything = useDeferredValue(true, false)
  const groups = groupRound(round)
  return (
    <div className="flex flex-col gap-6">
      {(everything ? groups : firstTasks(groups, FIRST_SCREEN_TASKS)).map((group) => (
        <AreaSection key={group.key} group={group}>
          {group.targets.map((target) => (
            <div key={target.key} className="flex flex-col gap-2">
              <h3 className="font-semibold text-tide-700">{target.label}</h3>
              <ul className="flex flex-col gap-2">
                {target.tasks.map((task) => (
                  <TaskItem
                    key={task.id}
                    task={task}
                    round={round}
                    expanded={expandedId === task.id}
                    advancedTo={advancedTo === task.id}
                    entry={outboxByTask.get(task.id)}
                    onToggle={() => onToggle(task.id)}
                    {...rest}
                  />
                ))}
              </ul>
            </div>
          ))}
        </AreaSection>
      ))}
    </div>
  )
}
