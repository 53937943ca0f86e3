import { ChevronRight, PencilLine } from 'lucide-react'
import type { AuditRow } from '#shared/schemas/report'
import { auditDiff, prettyJson } from '../utils/audit-diff'

const ACTIONS: Record<string, string> = { create: 'Created', update: 'Changed', delete: 'Deleted', amend: 'Corrected' }

interface AuditEntryProps {
  row: AuditRow
  who: string
  when: string
}

/** One change: a line that opens into its fields, before and after, changed ones marked in words. */
export function AuditEntry({ row, who, when }: AuditEntryProps) {
  const diff = auditDiff(row.before, row.after)
  const changed = diff.filter((d) => d.changed).length
  return (
    <details className="group border-t border-tide-100 first:border-t-0">
      <summary className="flex min-h-11 cursor-pointer list-none flex-wrap items-center gap-x-3 gap-y-0.5 px-3 py-2 text-sm hover:bg-tide-50">
        <ChevronRight aria-hidden className="size-4 shrink-0 text-tide-600 transition-transform group-open:rotate-90 print:hidden" />
        <span className="w-40 tabular-nums text-tide-700">{when}</span>
        <span className="font-semibold text-tide-900">{who}</span>
        <span className="text-tide-900">
          {ACTIONS[row.action] ?? row.action} {row.entity.replace('_', ' ')} {row.entityId}
        </span>
        <span className="text-tide-700">
          {changed} field{changed === 1 ? '' : 's'} changed
        </span>
      </summary>
      <div className="flex flex-col gap-2 px-3 pb-3 md:pl-10">
        <div className="overflow-x-auto">
          <table className="w-full min-w-[32rem] text-left text-sm">
            <caption className="sr-only">Fields before and after</caption>
            <thead className="text-tide-800">
              <tr>
                <th scope="col" className="px-2 py-1">
                  Field
                </th>
                <th scope="col" className="px-2 py-1">
                  Before
                </th>
                <th scope="col" className="px-2 py-1">
                  After
                </th>
              </tr>
            </thead>
            <tbody>
              {diff.map((d) => (
                <tr key={d.key} className={d.changed ? 'bg-ember-50' : undefined}>
                  <th scope="row" className="px-2 py-1 align-top font-semibold text-tide-900">
                    {d.key}
                    {d.changed && (
                      <span className="ml-1 inline-flex items-center gap-0.5 text-xs font-semibold text-ember-700">
                        <PencilLine aria-hidden className="size-3" /> changed
                      </span>
                    )}
                  </th>
                  <td className="max-w-xs break-words px-2 py-1 align-top font-mono text-xs text-tide-800">{d.before || '—'}</td>
                  <td className="max-w-xs break-words px-2 py-1 align-top font-mono text-xs text-tide-900">{d.after || '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <details className="print:hidden">
          <summary className="cursor-pointer text-sm font-semibold text-tide-700">Raw JSON</summary>
          <div className="mt-1 grid gap-2 md:grid-cols-2">
            <pre className="overflow-x-auto rounded-lg bg-tide-50 p-2 text-xs">{prettyJson(row.before)}</pre>
            <pre className="overflow-x-auto rounded-lg bg-tide-50 p-2 text-xs">{prettyJson(row.after)}</pre>
          </div>
        </details>
      </div>
    </details>
  )
}
