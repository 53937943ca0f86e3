import type { TankLimit } from '#shared/schemas/tank-page'
import { criticalText, hasLimits, okText } from '../utils/limit-text'

const SCOPE: Record<NonNullable<TankLimit['scope']>, string> = { facility: 'Whole facility', system: 'This system', batch: 'This batch' }

/** The limits that apply at this tank now: a batch's override wins over its system's, which wins over the facility's. */
export function LimitsTable({ limits }: { limits: TankLimit[] }) {
  const rows = limits.filter(hasLimits)
  if (rows.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No limits apply here yet.</p>
  return (
    <div tabIndex={0} role="region" aria-label="Limits for this tank" className="overflow-x-auto rounded-xl border border-tide-200 bg-white">
      <table className="w-full min-w-[34rem] text-left text-sm">
        <caption className="sr-only">Limits that apply at this tank</caption>
        <thead className="bg-tide-100 text-tide-800">
          <tr>
            <th scope="col" className="px-3 py-2">
              Reading
            </th>
            <th scope="col" className="px-3 py-2">
              Ok
            </th>
            <th scope="col" className="px-3 py-2">
              Critical when
            </th>
            <th scope="col" className="px-3 py-2">
              Set for
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((l) => (
            <tr key={l.key} className="border-t border-tide-100">
              <th scope="row" className="px-3 py-1.5 font-semibold text-tide-900">
                {l.name}
                {l.derived && <span className="font-normal text-tide-700"> (worked out)</span>}
              </th>
              <td className="px-3 py-1.5 tabular-nums">{okText(l, l.unit)}</td>
              <td className="px-3 py-1.5 tabular-nums">{criticalText(l, l.unit)}</td>
              <td className="px-3 py-1.5">{l.scope ? SCOPE[l.scope] : '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  )
}
