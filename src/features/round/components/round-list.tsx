import type { Round } from '#shared/schemas/round'
import type { SubmitOutcome } from '../api/use-submit-completion'
import type { OutboxEntry } from '../outbox/outbox-store'
import { groupRound } from '../utils/group-round'
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

export function RoundList({ round, expandedId, advancedTo, outboxByTask, onToggle, ...rest }: Props) {
  return (
    <div className="flex flex-col gap-6">
      {groupRound(round).map((group) => (
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
