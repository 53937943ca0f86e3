import { useQuery, useSuspenseQuery } from '@tanstack/react-query'
import { staffQueries } from '../../../api/staff'
import { reportQueries } from '../api/report-queries'
import type { AuditFilter } from '../utils/report-paths'
import { AuditEntry } from './audit-entry'

const when = (iso: string, timeZone: string) =>
  new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(
    new Date(iso),
  )

/** Who changed what, newest first; names when this role may read the staff list, numbers otherwise. */
export function AuditList({ filter, timeZone, canReadStaff }: { filter: AuditFilter; timeZone: string; canReadStaff: boolean }) {
  const { data: rows } = useSuspenseQuery(reportQueries.audit(filter))
  const staff = useQuery({ ...staffQueries.staff(), enabled: canReadStaff })
  const names = new Map((staff.data ?? []).map((p) => [p.id, p.name]))
  const who = (id: number | null) => (id === null ? 'Roundtide (scheduler)' : (names.get(id) ?? `Person #${id}`))
  if (rows.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No changes recorded in this range.</p>
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm text-tide-800">
        {rows.length} change{rows.length === 1 ? '' : 's'}
        {rows.length >= 1000 && ' (the newest 1000; narrow the range or the kind to see older ones)'}
      </p>
      <div className="rounded-xl border border-tide-200 bg-white">
        {rows.map((row) => (
          <AuditEntry key={row.id} row={row} who={who(row.personId)} when={when(row.at, timeZone)} />
        ))}
      </div>
    </div>
  )
}
