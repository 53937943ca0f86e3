import { clsx } from 'clsx'
import type { ReactNode } from 'react'

export interface ReportColumn<T> {
  label: string
  cell: (row: T) => ReactNode
  numeric?: boolean
  /** Long text that may wrap; everything else stays on one line. */
  wrap?: boolean
}

interface ReportTableProps<T> {
  caption: string
  columns: ReadonlyArray<ReportColumn<T>>
  rows: T[]
  rowKey: (row: T, index: number) => string
  emptyText: string
}

/** A dense table for desktop and paper that scrolls sideways on a phone, first column kept in view. */
export function ReportTable<T>({ caption, columns, rows, rowKey, emptyText }: ReportTableProps<T>) {
  return (
    <div
      tabIndex={0}
      role="region"
      aria-label="Report table"
      className="overflow-x-auto rounded-xl border border-tide-200 bg-white print:overflow-visible print:border-0"
    >
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-tide-100 text-tide-800">
          <tr>
            {columns.map((c, i) => (
              <th
                key={c.label}
                scope="col"
                className={clsx('whitespace-nowrap px-3 py-2 font-semibold', c.numeric && 'text-right', i === 0 && 'sticky left-0 bg-tide-100')}
              >
                {c.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, r) => (
            <tr key={rowKey(row, r)} className="border-t border-tide-100 align-top">
              {columns.map((c, i) => (
                <td
                  key={c.label}
                  className={clsx(
                    'px-3 py-1.5',
                    c.wrap ? 'min-w-40 whitespace-normal' : 'whitespace-nowrap',
                    c.numeric && 'text-right tabular-nums',
                    i === 0 && 'sticky left-0 bg-white font-semibold text-tide-900',
                  )}
                >
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          ))}
          {rows.length === 0 && (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-tide-700">
                {emptyText}
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  )
}
