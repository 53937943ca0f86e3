import { Trash2 } from 'lucide-react'
import { useState } from 'react'
import { toast } from 'sonner'
import type { CatalogueName } from '../../../api/catalogues'
import { Button } from '../../../components/ui/button'
import { useDeleteItem } from '../api/use-catalogue-mutations'

interface DeleteItemButtonProps {
  name: CatalogueName
  id: number
  /** What is deleted, in words: "tank N-04". */
  label: string
  /** Why it cannot go yet; the server keeps no links between catalogues, so the page checks. */
  blockedReason?: string
}

export function DeleteItemButton({ name, id, label, blockedReason }: DeleteItemButtonProps) {
  const remove = useDeleteItem(name)
  const [open, setOpen] = useState(false)
  const close = () => {
    setOpen(false)
    remove.reset()
  }

  if (!open) {
    return (
      <button
        type="button"
        aria-label={`Delete ${label}`}
        onClick={() => setOpen(true)}
        className="inline-flex min-h-11 items-center gap-1 rounded-lg px-2 font-semibold text-alarm-700 hover:bg-alarm-50 md:min-h-9"
      >
        <Trash2 aria-hidden className="size-4" /> Delete
      </button>
    )
  }

  return (
    <div
      role="group"
      aria-label={`Delete ${label}`}
      className="flex w-64 flex-col gap-2 whitespace-normal rounded-lg border border-alarm-100 bg-alarm-50 p-2 text-sm text-alarm-700"
    >
      {blockedReason ? (
        <>
          <p className="font-semibold">{blockedReason}</p>
          <Button type="button" variant="secondary" autoFocus onClick={close}>
            OK
          </Button>
        </>
      ) : (
        <>
          <p className="font-semibold">Delete {label}? This cannot be undone.</p>
          {remove.error && <p role="alert">{remove.error.message}</p>}
          <div className="flex flex-wrap gap-2">
            <Button
              type="button"
              variant="danger"
              disabled={remove.isPending}
              onClick={() => remove.mutate(id, { onSuccess: () => toast.success(`Deleted ${label}.`) })}
            >
              {remove.isPending ? 'Deleting…' : 'Delete'}
            </Button>
            <Button type="button" variant="secondary" autoFocus onClick={close}>
              Keep
            </Button>
          </div>
        </>
      )}
    </div>
  )
}
