import { X } from 'lucide-react'
import type { WeightEntry } from '../utils/weights'

/** The weights so far, newest last, each removable if it was mistyped. */
export function WeightList({ entries, onDelete }: { entries: WeightEntry[]; onDelete: (id: number) => void }) {
  if (entries.length === 0) return <p className="text-sm text-tide-600">No fish weighed yet.</p>
  return (
    <ol aria-label="Weights entered" className="grid grid-cols-2 gap-2 min-[370px]:grid-cols-3 sm:grid-cols-4 lg:grid-cols-6">
      {entries.map((e, index) => (
        <li key={e.id} className="flex min-h-11 items-center justify-between rounded-lg border border-tide-200 bg-tide-50 pl-2">
          <span className="whitespace-nowrap tabular-nums text-tide-900">
            <span className="text-xs text-tide-600">{index + 1}.</span> {e.grams.toFixed(e.decimals)} g
          </span>
          <button
            type="button"
            onClick={() => onDelete(e.id)}
            aria-label={`Delete fish ${index + 1} (${e.grams.toFixed(e.decimals)} g)`}
            className="inline-flex h-11 w-10 shrink-0 items-center justify-center rounded-lg text-tide-700 hover:bg-tide-100"
          >
            <X aria-hidden className="size-5" />
          </button>
        </li>
      ))}
    </ol>
  )
}
