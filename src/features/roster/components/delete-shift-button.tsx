import { Trash2 } from 'lucide-react'
import { useState } from 'react'
import { toast } from 'sonner'
import type { Shift } from '#shared/schemas/roster'
import { Button } from '../../../components/ui/button'
import { useDeleteShift } from '../api/use-roster-mutations'

export function DeleteShiftButton({ shift, onDeleted }: { shift: Shift; onDeleted: () => void }) {
  const remove = useDeleteShift()
  const [confirming, setConfirming] = useState(false)
  const doDelete = () =>
    remove.mutate(shift.id, {
      onSuccess: () => {
        toast.success(`Deleted ${shift.personName}’s shift.`)
        onDeleted()
      },
    })
  return confirming ? (
    <Button type="button" variant="danger" disabled={remove.isPending} onClick={doDelete}>
      <Trash2 aria-hidden className="size-4" /> {remove.isPending ? 'Deleting…' : 'Yes, delete this shift'}
    </Button>
  ) : (
    <Button type="button" variant="ghost" className="text-alarm-700 hover:bg-alarm-50" onClick={() => setConfirming(true)}>
      <Trash2 aria-hidden className="size-4" /> Delete shift
    </Button>
  )
}
