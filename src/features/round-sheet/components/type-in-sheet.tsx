import type { Round } from '#shared/schemas/round'
import { groupByArea } from '../utils/group-by-area'
import { PaperTaskForm } from './paper-task-form'

interface TypeInSheetProps {
  round: Round
  people: Array<{ id: number; name: string }>
  defaultPersonId: number | null
}

/** A paper sheet typed back in, task by task in walking order; each saves on its own and says how it went. */
export function TypeInSheet({ round, people, defaultPersonId }: TypeInSheetProps) {
  const groups = groupByArea(round)
  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-2xl text-sm text-tide-800">
        Copy each task from the paper: its readings, the time written beside it and who did it. Roundtide checks every reading against its limits as if it had
        been entered on the round; out-of-range readings are flagged and escalated but raise no recheck.
      </p>
      {groups.length === 0 && <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No tasks on this sheet.</p>}
      {groups.map((g) => (
        <section key={g.key} aria-label={g.area?.name ?? 'Elsewhere'} className="flex flex-col gap-2">
          <h2 className="text-lg font-bold text-tide-900">{g.area?.name ?? 'Elsewhere'}</h2>
          <ul className="flex flex-col gap-2">
            {g.tasks.map((t) => (
              <PaperTaskForm key={t.id} task={t} date={round.date} timeZone={round.timeZone} people={people} defaultPersonId={defaultPersonId} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  )
}
