import { clsx } from 'clsx'
import { ArrowRight, CircleAlert, TriangleAlert } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { CylinderStatus } from '#shared/schemas/oxygen'

/** Says that a reading put a "replace cylinder" task on the board, and where to find it. */
export function ReplaceTaskNotice({ status, fresh }: { status: CylinderStatus; fresh: boolean }) {
  if (!status.replaceTaskId) return null
  const critical = status.level === 'critical'
  const Icon = critical ? CircleAlert : TriangleAlert
  return (
    <div
      role={fresh ? 'status' : undefined}
      className={clsx('flex flex-col gap-1 rounded-lg border p-3 text-sm', critical ? 'border-alarm-100 bg-alarm-50' : 'border-ember-100 bg-ember-50')}
    >
      <p className="flex items-start gap-2 text-tide-900">
        <Icon aria-hidden className={clsx('mt-0.5 size-4 shrink-0', critical ? 'text-alarm-700' : 'text-ember-700')} />
        <span>
          {fresh ? 'This reading raised a task to replace the cylinder' : 'A task to replace this cylinder is open'}
          {fresh && critical ? ', and the escalation ladder has started.' : '.'}
        </span>
      </p>
      <Link to={`/tasks/${status.replaceTaskId}`} className="inline-flex min-h-11 items-center gap-1 self-start font-semibold text-tide-800 underline">
        Open the replace task <ArrowRight aria-hidden className="size-4" />
      </Link>
    </div>
  )
}
