import { HandHelping } from 'lucide-react'
import { useTakeTask } from '../api/use-take-task'

export function TakeButton({ taskId, personId }: { taskId: number; personId: number }) {
  const take = useTakeTask(personId)
  return (
    <button
      type="button"
      disabled={take.isPending}
      onClick={() => take.mutate(taskId)}
      className="inline-flex min-h-12 items-center gap-2 rounded-xl bg-tide-100 px-3 font-semibold text-tide-800 hover:bg-tide-200 disabled:opacity-60"
    >
      <HandHelping aria-hidden className="size-5" /> {take.isPending ? 'Taking…' : 'Unassigned — take it'}
    </button>
  )
}
