import { Trash2 } from 'lucide-react'
import { useState } from 'react'
import { toast } from 'sonner'
import type { Routine } from '#shared/schemas/routine'
import { Button } from '../../../components/ui/button'
import { useDeleteRoutine } from '../api/use-delete-routine'

export function DeleteRoutineButton({ routine, onDeleted }: { routine: Routine; onDeleted: () => void }) {
  const remove = useDeleteRoutine()
  const [confirming, setConfirming] = useState(false)
  if (!confirming) {
    return (
      <Button type="button" variant="ghost" className="text-alarm-700 hover:bg-alarm-50" onClick={() => setConfirming(true)}>
        <Trash2 aria-hidden className="size-4" /> Delete routine
      </Button>
    )
  }
  return (
    <div
      role="group"
      aria-label="Confirm deletion"
      className="flex flex-col gap-2 rounded-lg border border-alarm-100 bg-alarm-50 p-3 sm:flex-row sm:items-center"
    >
      <p className="flex-1 text-sm text-alarm-700">Delete “{routine.name}”? Its untouched future tasks go too; done and past tasks stay as records.</p>
      <div className="flex gap-2">
        <Button
          type="button"
          variant="danger"
          disabled={remove.isPending}
          onClick={() =>
            remove.mutate(routine.id, {
              onSuccess: () => {
                toast.success(`Deleted “${routine.name}”.`)
                onDeleted()
              },
            })
          }
        >
          {remove.isPending ? 'Deleting…' : 'Delete'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setConfirming(false)}>
          Keep it
        </Button>
      </div>
    </div>
  )
}
