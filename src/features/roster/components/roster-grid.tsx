import { clsx } from 'clsx'
import { Phone, PhoneOff } from 'lucide-react'
import type { OnCallDuty, Shift } from '#shared/schemas/roster'
import { dayMonth, weekdayShort } from '../utils/roster-dates'
import { RosterCell } from './roster-cell'

type Row = { id: number; name: string }

// A duty runs handover to handover; on its last day the next holder takes over, so that day is theirs.
const holds = (d: OnCallDuty, date: string) => d.fromDate <= date && date < d.toDate

/** People down the side, days across; each cell holds shifts and the on-call marker. */
export function RosterGrid({
  dates,
  today,
  people,
  shifts,
  duties,
  onAdd,
  onEdit,
}: {
  dates: string[]
  today: string
  people: Row[]
  shifts: Shift[]
  duties: OnCallDuty[]
  onAdd: (personId: number, date: string) => void
  onEdit: (shift: Shift) => void
}) {
  // A fortnight must fit a laptop screen beside the sidebar, so its columns are narrower.
  const dayClass = (date: string) =>
    clsx('border-l border-tide-100 align-top', dates.length > 7 ? 'min-w-16 p-1' : 'min-w-28 p-1.5', date === today && 'bg-tide-50')
  return (
    <div className="overflow-x-auto rounded-xl border border-tide-200 bg-white">
      <table className={clsx('w-full border-collapse', dates.length > 7 ? 'text-xs' : 'text-sm')}>
        <caption className="sr-only">Shifts and on-call duty per person and day</caption>
        <thead className="bg-tide-100 text-tide-800">
          <tr>
            <th scope="col" className="sticky left-0 z-10 bg-tide-100 px-2 py-2 text-left font-semibold">
              Person
            </th>
            {dates.map((date) => (
              <th key={date} scope="col" className={clsx('px-1 py-2 text-left font-semibold', date === today && 'bg-tide-200')}>
                <span className="block">
                  {weekdayShort(date)}
                  {date === today && ' · today'}
                </span>
                <span className="block font-normal">{dayMonth(date)}</span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          <tr className="border-t border-tide-200">
            <th scope="row" className="sticky left-0 z-10 bg-white px-2 py-2 text-left font-semibold text-tide-900">
              On call
            </th>
            {dates.map((date) => {
              const holders = duties.filter((d) => holds(d, date))
              return (
                <td key={date} className={dayClass(date)}>
                  {holders.length ? (
                    holders.map((d) => (
                      <span key={d.id} className="flex items-center gap-1 font-semibold text-tide-900">
                        <Phone aria-hidden className="size-3.5 shrink-0 text-tide-600" /> {d.personName}
                      </span>
                    ))
                  ) : (
                    <span className="flex items-center gap-1 font-semibold text-alarm-700">
                      <PhoneOff aria-hidden className="size-3.5 shrink-0" /> Nobody
                    </span>
                  )}
                </td>
              )
            })}
          </tr>
          {people.map((p) => (
            <tr key={p.id} className="border-t border-tide-100">
              <th scope="row" className="sticky left-0 z-10 max-w-36 bg-white px-2 py-2 text-left align-top font-semibold text-tide-900">
                {p.name}
              </th>
              {dates.map((date) => (
                <td key={date} className={dayClass(date)}>
                  <RosterCell
                    personName={p.name}
                    date={date}
                    shifts={shifts.filter((s) => s.personId === p.id && s.date === date)}
                    onCall={duties.some((d) => d.personId === p.id && holds(d, date))}
                    onAdd={() => onAdd(p.id, date)}
                    onEdit={onEdit}
                  />
                </td>
              ))}
            </tr>
          ))}
          {people.length === 0 && (
            <tr>
              <td colSpan={dates.length + 1} className="px-3 py-6 text-center text-tide-600">
                Nobody to roster yet.
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  )
}
