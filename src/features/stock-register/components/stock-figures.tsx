import { Link } from 'react-router-dom'
import type { StockFigures as Figures } from '#shared/schemas/stock'

const whole = new Intl.NumberFormat('en-GB')
const kg = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 })

export interface FigureRow extends Figures {
  key: number
  label: string
  to: string
}

/** Count, biomass and stocking density from the register, with the same three per batch (or per tank) below. */
export function StockFigures({ figures, rows, rowsLabel, emptyText }: { figures: Figures; rows: FigureRow[]; rowsLabel: string; emptyText: string }) {
  return (
    <div className="flex flex-col gap-3 rounded-xl border border-tide-200 bg-white p-4">
      <dl className="grid grid-cols-3 gap-3">
        <Figure label="Fish now" value={whole.format(figures.count)} testId="stock-count" />
        <Figure label="Biomass" value={`${kg.format(figures.biomassKg)} kg`} />
        <Figure label="Stocking density" value={figures.densityKgM3 === null ? 'Volume unknown' : `${kg.format(figures.densityKgM3)} kg/m³`} />
      </dl>
      {rows.length === 0 ? (
        <p className="text-sm text-tide-700">{emptyText}</p>
      ) : (
        <table className="w-full text-left text-sm">
          <caption className="sr-only">{rowsLabel}</caption>
          <thead className="text-tide-700">
            <tr>
              <th scope="col" className="py-1 font-semibold">
                {rowsLabel}
              </th>
              <th scope="col" className="py-1 text-right font-semibold">
                Fish
              </th>
              <th scope="col" className="py-1 text-right font-semibold">
                Biomass
              </th>
              <th scope="col" className="py-1 text-right font-semibold">
                Density
              </th>
            </tr>
          </thead>
          <tbody className="tabular-nums text-tide-900">
            {rows.map((r) => (
              <tr key={r.key} className="border-t border-tide-100">
                <th scope="row" className="py-1 font-semibold">
                  <Link to={r.to} className="underline">
                    {r.label}
                  </Link>
                </th>
                <td className="py-1 text-right">{whole.format(r.count)}</td>
                <td className="py-1 text-right">{kg.format(r.biomassKg)} kg</td>
                <td className="py-1 text-right">{r.densityKgM3 === null ? '—' : `${kg.format(r.densityKgM3)} kg/m³`}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="text-xs text-tide-600">Counted from the stock register; biomass uses the latest mean weight, density the tank volume.</p>
    </div>
  )
}

function Figure({ label, value, testId }: { label: string; value: string; testId?: string }) {
  return (
    <div>
      <dt className="text-sm text-tide-600">{label}</dt>
      <dd className="text-xl font-bold text-tide-900 tabular-nums" data-testid={testId}>
        {value}
      </dd>
    </div>
  )
}
