import { Plus } from 'lucide-react'
import { useState } from 'react'
import type { Playbook } from '#shared/schemas/playbook'
import { Button } from '../../../components/ui/button'
import { PlaybookCard } from './playbook-card'
import { PlaybookEditor } from './playbook-editor'

type Editing = { id: number } | 'new' | null

export function PlaybookLibrary({ playbooks, canEdit }: { playbooks: Playbook[]; canEdit: boolean }) {
  const [editing, setEditing] = useState<Editing>(null)
  const done = () => setEditing(null)
  return (
    <section aria-labelledby="playbooks-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div>
          <h2 id="playbooks-heading" className="text-xl font-bold text-tide-900">
            Playbooks
          </h2>
          <p className="text-sm text-tide-700">The tasks an event brings with it, timed from the event’s start.</p>
        </div>
        {canEdit && editing === null && (
          <Button variant="secondary" onClick={() => setEditing('new')}>
            <Plus aria-hidden className="size-5" /> New playbook
          </Button>
        )}
      </div>
      {editing === 'new' && <PlaybookEditor playbook={null} onDone={done} />}
      {playbooks.length === 0 && editing !== 'new' && (
        <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
          No playbooks yet. {canEdit ? 'Write one for each kind of event your facility runs.' : 'A manager writes them.'}
        </p>
      )}
      {playbooks.map((p) =>
        editing !== null && editing !== 'new' && editing.id === p.id ? (
          <PlaybookEditor key={p.id} playbook={p} onDone={done} />
        ) : (
          <PlaybookCard key={p.id} playbook={p} onEdit={canEdit && editing === null ? () => setEditing({ id: p.id }) : undefined} />
        ),
      )}
    </section>
  )
}
