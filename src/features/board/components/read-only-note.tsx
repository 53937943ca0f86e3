import { Eye } from 'lucide-react'

export function ReadOnlyNote() {
  return (
    <p className="flex items-center gap-2 text-sm text-tide-700">
      <Eye aria-hidden className="size-4 shrink-0" /> You can read this board; supervisors and managers assign and move its tasks.
    </p>
  )
}
