import { RefreshCw, TriangleAlert } from 'lucide-react'
import { Button } from '../../../components/ui/button'

export function RoutineConflictNotice({ onReload, reloading }: { onReload: () => void; reloading: boolean }) {
  return (
    <div role="alert" className="flex flex-col gap-3 rounded-xl border border-ember-100 bg-ember-50 p-4 text-ember-700 sm:flex-row sm:items-center">
      <p className="flex flex-1 items-start gap-2">
        <TriangleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
        <span>
          <span className="font-semibold">Someone else changed this routine after you opened it.</span> Reload to see their version; your unsaved changes here
          will be replaced.
        </span>
      </p>
      <Button type="button" variant="secondary" onClick={onReload} disabled={reloading}>
        <RefreshCw aria-hidden className="size-4" /> {reloading ? 'Reloading…' : 'Reload routine'}
      </Button>
    </div>
  )
}
