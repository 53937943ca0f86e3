import { useQuery } from '@tanstack/react-query'
import type { Batch, System } from '#shared/schemas/facility'
import type { Limit, Parameter } from '#shared/schemas/parameter'
import { parameterQueries } from '../../../api/parameters'
import { Button } from '../../../components/ui/button'
import { ErrorState, LoadingState } from '../../../components/ui/page-state'

function range(min: number | null, max: number | null, unit: string) {
  if (min != null && max != null) return `${min} – ${max} ${unit}`
  if (min != null) return `${min} ${unit} or more`
  if (max != null) return `up to ${max} ${unit}`
  return 'any value'
}

function critical(min: number | null, max: number | null, unit: string) {
  const parts = [min != null && `below ${min} ${unit}`, max != null && `above ${max} ${unit}`].filter(Boolean)
  return parts.length ? parts.join(' or ') : 'never'
}

/** Current limits per parameter, read-only; a reading outside ok is watch, outside critical is critical. */
export function LimitsList({ systems, batches }: { systems: System[]; batches: Batch[] }) {
  const parameters = useQuery(parameterQueries.parameters())
  const limits = useQuery(parameterQueries.limits())
  if (parameters.isPending || limits.isPending) return <LoadingState label="Loading limits…" />
  if (parameters.isError || limits.isError) {
    return (
      <ErrorState
        title="Could not load the limits"
        message={(parameters.error ?? limits.error)?.message ?? ''}
        action={
          <Button
            variant="secondary"
            onClick={() => {
              void parameters.refetch()
              void limits.refetch()
            }}
          >
            Try again
          </Button>
        }
      />
    )
  }
  const byKey = new Map<string, Parameter>(parameters.data.map((p) => [p.key, p]))
  const scopeName = (l: Limit) => {
    if (l.scope === 'facility') return 'Whole facility'
    const list: Array<{ id: number; code: string }> = l.scope === 'system' ? systems : batches
    return `${l.scope === 'system' ? 'System' : 'Batch'} ${list.find((x) => x.id === l.scopeId)?.code ?? `#${l.scopeId}`}`
  }
  if (limits.data.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No limits set yet.</p>

  return (
    <div className="overflow-x-auto rounded-xl border border-tide-200 bg-white">
      <table className="w-full min-w-[40rem] text-left text-sm">
        <caption className="sr-only">Reading limits</caption>
        <thead className="bg-tide-100 text-tide-800">
          <tr>
            <th scope="col" className="px-3 py-2">
              Parameter
            </th>
            <th scope="col" className="px-3 py-2">
              Applies to
            </th>
            <th scope="col" className="px-3 py-2">
              Ok
            </th>
            <th scope="col" className="px-3 py-2">
              Critical when
            </th>
          </tr>
        </thead>
        <tbody>
          {limits.data.map((l) => {
            const p = byKey.get(l.parameterKey)
            const unit = p?.unit ?? ''
            return (
              <tr key={l.id} className="border-t border-tide-100">
                <th scope="row" className="px-3 py-1.5 font-semibold text-tide-900">
                  {p?.name ?? l.parameterKey}
                </th>
                <td className="px-3 py-1.5">{scopeName(l)}</td>
                <td className="px-3 py-1.5 tabular-nums">{range(l.okMin, l.okMax, unit)}</td>
                <td className="px-3 py-1.5 tabular-nums">{critical(l.criticalMin, l.criticalMax, unit)}</td>
              </tr>
            )
          })}
        </tbody>
      </table>
    </div>
  )
}
