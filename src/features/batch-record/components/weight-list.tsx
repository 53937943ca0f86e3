import { X } from 'lucide-react'
import type { WeightEntry } from '../utils/weights'

/** The weights so far, newest last, each removable if it was mistyped. */
export function WeightList({ entries, onDelete }: { entries: WeightEntry[]; onDelete: (id: number) => void }) {
  if (entries.length === 0) return <p className="text-sm text-tide-600">No fish weighed yet.</p>
  return (
    <ol aria-label="Weights entered" className="grid grid-cols-2 gap-2 min-[380px]:grid-cols-3 sm:grid-cols-4 lg:grid-cols-6">
      {entries.map((e, index) => (
        <li key={e.id} className="flex min-h-11 items-center justify-between gap-1 rounded-lg border border-tide-200 bg-tide-50 pl-3">
          <span className="tabular-nums text-tide-900">
            <span className="text-sm text-tide-600">{index + 1}.</span> {e.grams} g
          </span>
          <button type="button" onClick={() => onDelete(e.id)} aria-label={`Delete fish ${index + 1} (${e.grams} g)`} className="inline-flex size-11 items-center justify-center rounded-lg text-tide-700 hover:bg-tide-100">
            <X aria-hidden className="size-5" />
          </button>
        </li>
      ))}
    </ol>
  )
}
