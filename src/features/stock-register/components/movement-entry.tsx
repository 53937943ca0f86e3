import { clsx } from 'clsx'
import { CornerDownRight, Undo2 } from 'lucide-react'
import type { Movement } from '#shared/schemas/stock'
import { formatWhen } from '../../../lib/zone-format'
import { countChange, movementFacts, movementPlaces, signed, type LedgerView } from '../utils/movement-text'
import { MovementKindLabel } from './movement-kind-label'

interface Props {
  movement: Movement
  view: LedgerView
  timeZone: string
  corrected: Movement | undefined
  correctedBy: Movement[]
}

/** One line of the register: what happened, how many, where, why, who and when; corrections point both ways. */
export function MovementEntry({ movement: m, view, timeZone, corrected, correctedBy }: Props) {
  const change = countChange(m, view)
  const places = movementPlaces(m)
  const facts = movementFacts(m)
  return (
    <li id={`movement-${m.id}`} className="flex flex-col gap-0.5 border-t border-tide-100 py-2 first:border-t-0 target:bg-tide-50">
      <p className="flex flex-wrap items-baseline justify-between gap-x-3">
        <span className="inline-flex flex-wrap items-baseline gap-x-2">
          <MovementKindLabel kind={m.kind} />
          <span className="text-sm text-tide-600">#{m.id}</span>
        </span>
        <span className={clsx('font-bold tabular-nums', change < 0 ? 'text-ember-700' : 'text-tide-900')}>
          {signed(change)} fish{change === 0 && m.kind !== 'correction' ? ` (${m.count.toLocaleString('en-GB')} moved)` : ''}
        </span>
      </p>
      <p className="text-sm text-tide-800">
        <time dateTime={m.occurredAt}>{formatWhen(m.occurredAt, timeZone)}</time>
        {'batchId' in view ? '' : ` · batch ${m.batchCode}`}
        {places && ` · ${places}`}
      </p>
      {facts.length > 0 && <p className="text-sm text-tide-800">{facts.join(' · ')}</p>}
      <p className="text-xs text-tide-600">Recorded by {m.personName}</p>
      {corrected && (
        <p className="flex items-center gap-1 text-sm font-semibold text-tide-800">
          <CornerDownRight aria-hidden className="size-4" /> Corrects{' '}
          <a href={`#movement-${corrected.id}`} className="underline">
            #{corrected.id} ({corrected.kind}, {corrected.count} fish)
          </a>
        </p>
      )}
      {m.correctsId && !corrected && <p className="text-sm text-tide-800">Corrects #{m.correctsId}</p>}
      {correctedBy.length > 0 && (
        <p className="flex items-center gap-1 text-sm font-semibold text-ember-700">
          <Undo2 aria-hidden className="size-4" /> Corrected by{' '}
          {correctedBy.map((c, i) => (
            <span key={c.id}>
              {i > 0 && ', '}
              <a href={`#movement-${c.id}`} className="underline">
                #{c.id} ({signed(c.count)})
              </a>
            </span>
          ))}
        </p>
      )}
    </li>
  )
}
