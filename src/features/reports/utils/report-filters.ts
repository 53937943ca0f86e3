import { COMPLIANCE_GROUPINGS, REPORT_PERIODS } from '#shared/schemas/report'
import { rangeFrom } from './date-range'
import { type ComplianceFilter, type DateRange, type StockFilter, type WelfareFilter } from './report-paths'

export interface ReportFilters {
  range: DateRange
  compliance: ComplianceFilter
  welfare: WelfareFilter
  stock: StockFilter
}

/** Everything the reports page shows, read from its address so it can be bookmarked and printed again. */
export function reportFilters(search: URLSearchParams, timeZone: string): ReportFilters {
  const range = rangeFrom(search, timeZone)
  const by = COMPLIANCE_GROUPINGS.find((g) => g === search.get('by')) ?? 'category'
  const period = REPORT_PERIODS.find((p) => p === search.get('period')) ?? 'day'
  const tankIds = (search.get('tankIds') ?? '')
    .split(',')
    .map(Number)
    .filter((n) => Number.isInteger(n) && n > 0)
  const batchId = /^[1-9]\d*$/.test(search.get('batchId') ?? '') ? search.get('batchId')! : ''
  return { range, compliance: { ...range, by, period }, welfare: { ...range, tankIds }, stock: { ...range, batchId } }
}
