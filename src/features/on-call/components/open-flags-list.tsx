import { Flag } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { OpenFlag } from '../api/on-call-queries'
import { formatWhen } from '../../../lib/zone-format'
import { BandBadge } from '../../../components/ui/band-badge'
import { OnCallSection } from './on-call-section'
import { TaskStatusLabel } from '../../../components/ui/task-status-label'

/** Flags from the last three days, each with how its recheck stands. */
export function OpenFlagsList({ flags, timeZone }: { flags: OpenFlag[]; timeZone: string }) {
  return (
    <OnCallSection title="Open flags" icon={Flag} count={flags.length}>
      {flags.length === 0 ? (
        <p className="text-tide-700">No flags in the last three days.</p>
      ) : (
        <ul className="divide-y divide-tide-100">
          {flags.map(({ task, recheck }) => (
            <li key={task.id} className="flex flex-col gap-1 py-2">
              <div className="flex flex-wrap items-center gap-2">
                {task.flag && <BandBadge band={task.flag} prefix="Flag" />}
                <Link to={`/tasks/${task.id}`} className="font-semibold text-tide-900 underline-offset-2 hover:underline">
                  {task.title}
                </Link>
              </div>
              <p className="text-sm text-tide-600">
                {task.targetLabel}
                {task.completedAt && ` · recorded ${formatWhen(task.completedAt, timeZone)}`}
                {task.completedByName && ` by ${task.completedByName}`}
              </p>
              <p className="flex flex-wrap items-center gap-2 text-sm text-tide-800">
                {recheck ? (
                  <>
                    Recheck at {recheck.localTime.slice(0, 5)}: <TaskStatusLabel status={recheck.status} />
                    {recheck.flag && <BandBadge band={recheck.flag} />}
                  </>
                ) : (
                  'No recheck task'
                )}
              </p>
            </li>
          ))}
        </ul>
      )}
    </OnCallSection>
  )
}
