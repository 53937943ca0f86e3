import { deadlineStatuses } from '#shared/incidents/deadlines'
import { INCIDENT_STATUSES, type Incident } from '#shared/schemas/incident'

export type IncidentStatus = (typeof INCIDENT_STATUSES)[number]

export interface IncidentFilters {
  status: IncidentStatus | 'active' | 'all'
  overdueOnly: boolean
  text: string
}

const STATUS_CHOICES = ['active', 'all', ...INCIDENT_STATUSES] as const

/** Filters live in the address, so a filtered list can be shared or reloaded. */
export function filtersFrom(params: URLSearchParams): IncidentFilters {
  const status = STATUS_CHOICES.find((s) => s === params.get('status')) ?? 'active'
  return { status, overdueOnly: params.get('overdue') === '1', text: params.get('q') ?? '' }
}

/** "Active" is what still needs someone: proposed, open or reported. */
export function filterIncidents(list: Incident[], f: IncidentFilters, now: Date): Incident[] {
  const text = f.text.trim().toLowerCase()
  return list.filter((i) => {
    if (f.status === 'active' && !['proposed', 'open', 'reported'].includes(i.status)) return false
    if (f.status !== 'active' && f.status !== 'all' && i.status !== f.status) return false
    if (f.overdueOnly && !deadlineStatuses(i, now).some((d) => d.state === 'overdue')) return false
    return !text || `#${i.id} ${i.title} ${i.whatHappened}`.toLowerCase().includes(text)
  })
}
