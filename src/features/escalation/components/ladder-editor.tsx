import { ListOrdered, Pencil, Plus } from 'lucide-react'
import { useState } from 'react'
import type { Ladder } from '#shared/schemas/ladder'
import type { StaffMember } from '#shared/schemas/person'
import { Button } from '../../../components/ui/button'
import { describeDelay, describeRecipient } from '../utils/recipient-text'
import { LadderForm } from './ladder-form'

/** The facility's ladders, each step as "after N minutes, notify whom"; one is edited at a time. */
export function LadderEditor({ ladders, staff }: { ladders: Ladder[]; staff: StaffMember[] }) {
  const [editing, setEditing] = useState<number | 'new' | null>(null)
  const names = new Map(staff.map((p) => [p.id, p.name]))
  return (
    <div className="flex flex-col gap-3">
      {ladders.length === 0 && editing !== 'new' && (
        <p className="rounded-xl border border-tide-200 bg-white p-4 text-tide-700">
          No ladders yet. Until there are, missed work escalates to the assignee, then on call, then managers; urgent work to the assignee and on call at once,
          then supervisors, then managers.
        </p>
      )}
      <ul className="flex flex-col gap-3">
        {ladders.map((ladder) =>
          editing === ladder.id ? (
            <li key={ladder.id}>
              <LadderForm ladder={ladder} staff={staff} onDone={() => setEditing(null)} />
            </li>
          ) : (
            <li key={ladder.id} className="flex flex-col gap-2 rounded-xl border border-tide-200 bg-white p-4 sm:flex-row sm:items-start sm:justify-between">
              <div className="min-w-0">
                <p className="flex items-center gap-2 font-bold text-tide-900">
                  <ListOrdered aria-hidden className="size-5 text-tide-600" /> {ladder.name}
                </p>
                <ol className="mt-1 text-sm text-tide-700">
                  {ladder.steps.map((s, i) => (
                    <li key={i}>
                      {describeDelay(s.afterMinutes)}: {s.notify.map((r) => describeRecipient(r, names)).join(', ')}
                    </li>
                  ))}
                </ol>
              </div>
              <Button type="button" variant="secondary" disabled={editing !== null} onClick={() => setEditing(ladder.id)} aria-label={`Edit ${ladder.name}`}>
                <Pencil aria-hidden className="size-4" /> Edit
              </Button>
            </li>
          ),
        )}
      </ul>
      {editing === 'new' ? (
        <LadderForm ladder={null} staff={staff} onDone={() => setEditing(null)} />
      ) : (
        <Button type="button" variant="secondary" disabled={editing !== null} onClick={() => setEditing('new')} className="self-start">
          <Plus aria-hidden className="size-5" /> New ladder
        </Button>
      )}
    </div>
  )
}
