import type { ComplianceGrouping, ReportPeriod } from '#shared/schemas/report'

export interface DateRange {
  from: string
  to: string
}
export type ComplianceFilter = DateRange & { by: ComplianceGrouping; period: ReportPeriod }
export type WelfareFilter = DateRange & { tankIds: number[] }
export type AuditFilter = DateRange & { entity: string }
/** One batch by id, or '' for every batch. */
export type StockFilter = DateRange & { batchId: string }

type Filters = { compliance: ComplianceFilter; responses: DateRange; welfare: WelfareFilter; audit: AuditFilter; stock: StockFilter; incidents: DateRange }

function search(filter: object) {
  const params = new URLSearchParams()
  for (const [key, value] of Object.entries(filter)) {
    const text = Array.isArray(value) ? value.join(',') : String(value)
    if (text !== '') params.set(key, text)
  }
  return params
}

/** The API path of a report, as apiFetch takes it (without the /api prefix). */
export function reportPath<K extends keyof Filters>(name: K, filter: Filters[K]) {
  return `${name === 'audit' ? '/audit' : `/reports/${name}`}?${search(filter)}`
}

/** The same report as a CSV file: a plain same-origin link, so the session cookie goes with it. */
export const csvHref = <K extends keyof Filters>(name: K, filter: Filters[K]) => `/api${reportPath(name, filter)}&format=csv`
