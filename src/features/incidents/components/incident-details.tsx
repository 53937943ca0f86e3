import type { ReactNode } from 'react'
import { Link } from 'react-router-dom'
import type { Incident } from '#shared/schemas/incident'
import { formatWhen } from '../../../lib/zone-format'

interface Props {
  incident: Incident
  timeZone: string
  tankCodes: Map<number, string>
  batchCodes: Map<number, string>
}

const Row = ({ label, children }: { label: string; children: ReactNode }) => (
  <div className="flex flex-col gap-0.5 border-t border-tide-100 py-2 sm:flex-row sm:gap-4">
    <dt className="text-sm font-semibold text-tide-700 sm:w-44 sm:shrink-0">{label}</dt>
    <dd className="text-tide-900 whitespace-pre-line">{children}</dd>
  </div>
)

const orNone = (text: string, none = 'Not filled in yet') => (text.trim() ? text : <span className="text-tide-600 italic">{none}</span>)

/** The record as the committee reads it. */
export function IncidentDetails({ incident: i, timeZone, tankCodes, batchCodes }: Props) {
  return (
    <dl className="rounded-xl border border-tide-200 bg-white px-4 py-1">
      <Row label="What happened">{orNone(i.whatHappened)}</Row>
      <Row label="Started · noticed">
        {formatWhen(i.startedAt, timeZone)} · {formatWhen(i.noticedAt, timeZone)}
      </Row>
      <Row label="Tanks">
        {i.tankIds.length
          ? i.tankIds.map((id, n) => (
              <span key={id}>
                {n > 0 && ', '}
                <Link to={`/tanks/${id}`} className="underline">
                  {tankCodes.get(id) ?? `tank ${id}`}
                </Link>
              </span>
            ))
          : orNone('', 'None')}
      </Row>
      <Row label="Batches">
        {i.batchIds.length
          ? i.batchIds.map((id, n) => (
              <span key={id}>
                {n > 0 && ', '}
                <Link to={`/batches/${id}`} className="underline">
                  {batchCodes.get(id) ?? `batch ${id}`}
                </Link>
              </span>
            ))
          : orNone('', 'None')}
      </Row>
      <Row label="People involved">{i.people.length ? i.people.map((p) => p.name).join(', ') : orNone('', 'None')}</Row>
      <Row label="Animals">
        {i.affected} affected · {i.dead} dead
      </Row>
      <Row label="Immediate actions">{orNone(i.immediateActions)}</Row>
      <Row label="Who was told">
        {i.told.length ? i.told.map((t) => `${t.who} (${formatWhen(t.at, timeZone)})`).join('\n') : orNone('', 'Nobody recorded yet')}
      </Row>
      <Row label="Root cause">{orNone(i.rootCause)}</Row>
      <Row label="Corrective actions">{orNone(i.correctiveActions)}</Row>
      {i.filedByName && <Row label="Filed by hand by">{i.filedByName}</Row>}
      {i.taskId && (
        <Row label="From the task">
          <Link to={`/tasks/${i.taskId}`} className="underline">
            Task #{i.taskId}
          </Link>
        </Row>
      )}
    </dl>
  )
}
