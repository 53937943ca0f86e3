import { NotebookPen } from 'lucide-react'
import type { HandoverNote } from '#shared/schemas/roster'
import { formatWhen } from '../../../lib/zone-format'
import { HandoverNoteForm } from './handover-note-form'
import { OnCallSection } from './on-call-section'

/** The latest notes, newest first, so the incoming holder reads what the outgoing one left. */
export function HandoverNotes({ notes, timeZone, canWrite }: { notes: HandoverNote[]; timeZone: string; canWrite: boolean }) {
  return (
    <OnCallSection title="Handover notes" icon={NotebookPen} count={notes.length}>
      {canWrite && <HandoverNoteForm />}
      {notes.length === 0 ? (
        <p className="mt-3 text-tide-700">No handover notes yet.</p>
      ) : (
        <ul aria-label="Handover notes" className="mt-3 flex flex-col gap-3">
          {notes.map((n) => (
            <li key={n.id} className="rounded-lg bg-tide-50 p-3">
              <p className="text-sm text-tide-600">
                <span className="font-semibold text-tide-800">{n.personName}</span> · {formatWhen(n.createdAt, timeZone)}
              </p>
              <p className="mt-1 whitespace-pre-wrap text-tide-900">{n.text}</p>
            </li>
          ))}
        </ul>
      )}
    </OnCallSection>
  )
}
