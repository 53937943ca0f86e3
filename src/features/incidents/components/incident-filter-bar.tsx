import { Search } from 'lucide-react'
import { INCIDENT_STATUSES } from '#shared/schemas/incident'
import { SelectField } from '../../../components/ui/select-field'
import type { IncidentFilters } from '../utils/incident-filters'
import { INCIDENT_STATUS_LOOK } from './incident-status-label'

/** Status, overdue only, and words in the title. */
export function IncidentFilterBar({ filters, onChange }: { filters: IncidentFilters; onChange: (next: Partial<IncidentFilters>) => void }) {
  return (
    <div role="search" aria-label="Filter incidents" className="flex flex-wrap items-end gap-3 rounded-xl border border-tide-200 bg-white p-3">
      <SelectField label="Status" value={filters.status} onChange={(e) => onChange({ status: e.target.value as IncidentFilters['status'] })} className="w-56">
        <option value="active">Needs attention</option>
        <option value="all">All</option>
        {INCIDENT_STATUSES.map((s) => (
          <option key={s} value={s}>
            {INCIDENT_STATUS_LOOK[s].label}
          </option>
        ))}
      </SelectField>
      <label className="flex min-h-11 items-center gap-2 font-semibold text-tide-800">
        <input type="checkbox" className="size-5" checked={filters.overdueOnly} onChange={(e) => onChange({ overdueOnly: e.target.checked })} /> Overdue only
      </label>
      <div className="flex min-w-48 flex-1 flex-col gap-1">
        <label htmlFor="incident-search" className="text-sm font-semibold text-tide-800">
          Search
        </label>
        <div className="flex items-center rounded-lg border border-tide-200 bg-white px-2">
          <Search aria-hidden className="size-4 text-tide-600" />
          <input
            id="incident-search"
            type="search"
            value={filters.text}
            onChange={(e) => onChange({ text: e.target.value })}
            className="min-h-11 w-full bg-transparent px-2 text-base outline-none"
          />
        </div>
      </div>
    </div>
  )
}
