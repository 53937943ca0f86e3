import { Pencil } from 'lucide-react'
import type { CatalogueName } from '../../../api/catalogues'
import { DeleteItemButton } from './delete-item-button'

interface RowActionsProps {
  name: CatalogueName
  id: number
  label: string
  onEdit: () => void
  blockedReason?: string
}

export function RowActions({ name, id, label, onEdit, blockedReason }: RowActionsProps) {
  return (
    <div className="flex items-start gap-1">
      <button
        type="button"
        aria-label={`Edit ${label}`}
        onClick={onEdit}
        className="inline-flex min-h-11 items-center gap-1 rounded-lg px-2 font-semibold text-tide-700 hover:bg-tide-100 md:min-h-9"
      >
        <Pencil aria-hidden className="size-4" /> Edit
      </button>
      <DeleteItemButton name={name} id={id} label={label} blockedReason={blockedReason} />
    </div>
  )
}
