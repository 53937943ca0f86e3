import { clsx } from 'clsx'
import { CircleCheck, Fish, PackageCheck, ShieldAlert, Square } from 'lucide-react'
import type { Batch, Tank } from '#shared/schemas/facility'
import { formatDate } from '../utils/zone-format'

const STATUS = {
  quarantine: { label: 'Quarantine', icon: ShieldAlert, tone: 'text-ember-700' },
  active: { label: 'Active', icon: CircleCheck, tone: 'text-kelp-700' },
  dispatched: { label: 'Dispatched', icon: PackageCheck, tone: 'text-tide-700' },
  ended: { label: 'Ended', icon: Square, tone: 'text-tide-600' },
} as const

export function BatchSummary({ batch, tanks }: { batch: Batch; tanks: Tank[] }) {
  const s = STATUS[batch.status]
  const codes = batch.tankIds.map((id) => tanks.find((t) => t.id === id)?.code ?? `#${id}`)
  return (
    <section aria-label="Batch" className="rounded-xl border border-tide-200 bg-white p-4">
      <p className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <Fish aria-hidden className="size-5 text-tide-600" />
        <span className="text-lg font-semibold text-tide-900">{batch.species}</span>
        <span className={clsx('inline-flex items-center gap-1 text-sm font-semibold', s.tone)}>
          <s.icon aria-hidden className="size-4" /> {s.label}
        </span>
      </p>
      <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
        <div>
          <dt className="text-sm text-tide-600">Count</dt>
          <dd className="font-semibold text-tide-900 tabular-nums">{batch.count.toLocaleString('en-GB')}</dd>
        </div>
        <div>
          <dt className="text-sm text-tide-600">Mean weight</dt>
          <dd className="font-semibold text-tide-900 tabular-nums" data-testid="batch-mean">
            {batch.meanWeightG} g
          </dd>
        </div>
        <div>
          <dt className="text-sm text-tide-600">Tanks</dt>
          <dd className="text-tide-900">{codes.join(', ') || 'None'}</dd>
        </div>
        <div>
          <dt className="text-sm text-tide-600">Arrived</dt>
          <dd className="text-tide-900">{formatDate(batch.arrivalDate)}</dd>
        </div>
      </dl>
      {batch.origin && <p className="mt-2 text-sm text-tide-700">From {batch.origin}</p>}
    </section>
  )
}
