import { CirclePause } from 'lucide-react'

export function PausedLabel() {
  return (
    <span className="inline-flex items-center gap-1 rounded-full bg-tide-100 px-2 py-0.5 text-sm font-semibold text-tide-800">
      <CirclePause aria-hidden className="size-4" /> Paused
    </span>
  )
}
