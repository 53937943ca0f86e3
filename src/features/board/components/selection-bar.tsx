import { SquareCheckBig, X } from 'lucide-react'

export function SelectionBar({ count, onClear }: { count: number; onClear: () => void }) {
  return (
    <div role="status" className="flex flex-wrap items-center gap-3 rounded-lg bg-tide-800 px-3 py-1.5 text-white">
      <span className="flex items-center gap-1.5 font-semibold">
        <SquareCheckBig aria-hidden className="size-5" /> {count} selected
      </span>
      <span className="text-sm text-tide-100">Drag any of them to move them together.</span>
      <button type="button" onClick={onClear} className="ml-auto inline-flex min-h-9 items-center gap-1 rounded px-2 font-semibold hover:bg-tide-700">
        <X aria-hidden className="size-4" /> Clear selection
      </button>
    </div>
  )
}
