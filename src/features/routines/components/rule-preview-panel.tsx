import { ArrowRightLeft, CalendarX, CirclePause, MessageSquareText } from 'lucide-react'
import { useDeferredValue, useMemo, useState } from 'react'
import { useWatch } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { formatOffset, previewRule, summariseRule } from '../utils/rule-preview'
import { formatLocalDate, weekdayOf } from '../utils/zone-dates'

const PREVIEW_COUNT = 10

export function RulePreviewPanel({ timeZone }: { timeZone: string }) {
  const [rrule = '', dtstart = '', activeFrom, activeTo, skipDates, paused] = useWatch<RoutineInput>({
    name: ['rrule', 'dtstart', 'activeFrom', 'activeTo', 'skipDates', 'paused'],
  }) as [string?, string?, string?, string?, string[]?, boolean?]
  const [now] = useState(() => new Date())
  // Typing stays responsive; the preview catches up a moment later. The inputs travel as one
  // string so the memo sees a stable value.
  const inputs = useDeferredValue(JSON.stringify({ rrule, dtstart, activeFrom, activeTo, skipDates }))
  const { deferred, preview } = useMemo(() => {
    const values = JSON.parse(inputs) as { rrule: string; dtstart: string; activeFrom?: string; activeTo?: string; skipDates?: string[] }
    return { deferred: values, preview: previewRule({ ...values, timeZone, now, limit: PREVIEW_COUNT }) }
  }, [inputs, timeZone, now])

  return (
    <div className="flex min-w-0 flex-col gap-3">
      <div aria-live="polite" className="rounded-lg bg-tide-50 p-3">
        <p className="flex items-center gap-1 text-sm font-semibold text-tide-700">
          <MessageSquareText aria-hidden className="size-4" /> In plain words
        </p>
        <p data-testid="rule-summary" className="mt-1 text-lg font-semibold text-tide-900">
          {preview.error ? 'No schedule until the rule is fixed.' : summariseRule(deferred.rrule, deferred.dtstart)}
        </p>
      </div>
      {paused && (
        <p className="flex items-center gap-2 text-sm font-semibold text-tide-800">
          <CirclePause aria-hidden className="size-4" /> Paused: no tasks are made until it is resumed.
        </p>
      )}
      <div>
        <h3 id="rule-preview-heading" className="font-bold text-tide-900">
          Next {PREVIEW_COUNT} dates
        </h3>
        <p className="text-sm text-tide-600">Facility time, {timeZone}</p>
      </div>
      {preview.error !== null && <p className="text-tide-700">The dates show here once the rule is valid.</p>}
      {preview.rows?.length === 0 && <p className="text-tide-700">No dates from now on: the rule or the active period has ended.</p>}
      {preview.rows && preview.rows.length > 0 && (
        <table aria-labelledby="rule-preview-heading" className="w-full text-left text-sm tabular-nums">
          <thead className="text-tide-700">
            <tr className="border-b border-tide-200">
              <th scope="col" className="py-1.5 pr-2 font-semibold">
                Day
              </th>
              <th scope="col" className="py-1.5 pr-2 font-semibold">
                Date
              </th>
              <th scope="col" className="py-1.5 pr-2 font-semibold">
                Time
              </th>
              <th scope="col" className="py-1.5 font-semibold">
                UTC offset
              </th>
            </tr>
          </thead>
          <tbody>
            {preview.rows.map((row) => (
              <tr key={row.utc} className={row.skipped ? 'border-b border-tide-100 text-tide-500' : 'border-b border-tide-100 text-tide-900'}>
                <td className="py-1.5 pr-2 font-semibold">{weekdayOf(row.local)}</td>
                <td className="py-1.5 pr-2">
                  {formatLocalDate(row.local)}
                  {row.skipped && (
                    <span className="ml-1 inline-flex items-center gap-0.5 text-xs font-semibold text-tide-700">
                      <CalendarX aria-hidden className="size-3.5" /> skipped
                    </span>
                  )}
                </td>
                <td className="py-1.5 pr-2">{row.local.slice(11, 16)}</td>
                <td className="py-1.5">
                  {row.offsetChanged ? (
                    <span className="inline-flex items-center gap-1 font-semibold text-ember-700">
                      <ArrowRightLeft aria-hidden className="size-3.5" /> {formatOffset(row.offsetMinutes)}, clocks changed
                    </span>
                  ) : (
                    formatOffset(row.offsetMinutes)
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  )
}
