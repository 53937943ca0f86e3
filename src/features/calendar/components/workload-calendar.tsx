import type { DatesSetArg, DayCellContentArg } from '@fullcalendar/core'
import enGbLocale from '@fullcalendar/core/locales/en-gb'
import dayGridPlugin from '@fullcalendar/daygrid'
import interactionPlugin, { type DateClickArg } from '@fullcalendar/interaction'
import FullCalendar from '@fullcalendar/react'
import { keepPreviousData, useQuery } from '@tanstack/react-query'
import { useCallback, useMemo, useRef, useState } from 'react'
import { Button } from '../../../components/ui/button'
import { ErrorState } from '../../../components/ui/page-state'
import { calendarQueries } from '../api/calendar-queries'
import { CALENDAR_VIEWS, isoDay, viewNameOf, visibleRange, type CalendarViewName } from '../utils/calendar-dates'
import { CalendarLegend } from './calendar-legend'
import { CalendarToolbar } from './calendar-toolbar'
import { DaySummary } from './day-summary'
import './workload-calendar.css'

interface Props {
  initialDate: string | null
  initialView: CalendarViewName
  onOpenDay: (date: string) => void
  /** Told the first day and view on screen, e.g. to keep them in the address. */
  onShown: (date: string, view: CalendarViewName) => void
}

interface Shown {
  from: string
  to: string
  title: string
  view: CalendarViewName
}

const PLUGINS = [dayGridPlugin, interactionPlugin]
const VIEWS = { dayGridWeek: { dayHeaderFormat: { weekday: 'short', day: 'numeric', month: 'short' } } } as const

/**
 * FullCalendar's day grid with our own toolbar. The visible range (from `datesSet`) drives the
 * query, so only what is on screen is fetched; the calendar API is called from clicks only.
 */
export function WorkloadCalendar({ initialDate, initialView, onOpenDay, onShown }: Props) {
  const ref = useRef<FullCalendar>(null)
  const [shown, setShown] = useState<Shown | null>(null)
  const query = useQuery({
    ...calendarQueries.range(shown?.from ?? '', shown?.to ?? ''),
    enabled: shown !== null,
    placeholderData: keepPreviousData,
  })
  const byDate = useMemo(() => new Map((query.data ?? []).map((d) => [d.date, d])), [query.data])
  const api = () => ref.current?.getApi()

  const datesSet = useCallback(
    (arg: DatesSetArg) => {
      const view = viewNameOf(arg.view.type)
      setShown({ ...visibleRange(arg.start, arg.end), title: arg.view.title, view })
      onShown(isoDay(arg.view.currentStart), view)
    },
    [onShown],
  )
  const dayCellContent = useCallback(
    (arg: DayCellContentArg) => (
      <DaySummary dayNumber={String(arg.date.getDate())} day={byDate.get(isoDay(arg.date))} roomy={arg.view.type === CALENDAR_VIEWS.week} />
    ),
    [byDate],
  )
  const dateClick = useCallback((arg: DateClickArg) => onOpenDay(arg.dateStr), [onOpenDay])
  const navLinkDayClick = useCallback((date: Date) => onOpenDay(isoDay(date)), [onOpenDay])

  return (
    <div className="flex flex-col gap-3">
      <CalendarToolbar
        title={shown?.title ?? ''}
        view={shown?.view ?? initialView}
        loading={query.isFetching}
        onPrev={() => api()?.prev()}
        onNext={() => api()?.next()}
        onToday={() => api()?.today()}
        onView={(v) => api()?.changeView(CALENDAR_VIEWS[v])}
      />
      <CalendarLegend />
      {query.isError && (
        <ErrorState
          title="Could not load the workload for these days"
          message={query.error.message}
          action={
            <Button variant="secondary" onClick={() => void query.refetch()}>
              Try again
            </Button>
          }
        />
      )}
      <div className="roundtide-calendar overflow-hidden rounded-xl bg-white ring-1 ring-tide-200" aria-busy={query.isPending && shown !== null}>
        <FullCalendar
          ref={ref}
          plugins={PLUGINS}
          initialView={CALENDAR_VIEWS[initialView]}
          initialDate={initialDate ?? undefined}
          locale={enGbLocale}
          height="auto"
          headerToolbar={false}
          fixedWeekCount={false}
          navLinks
          navLinkHint="Open the board for $0"
          navLinkDayClick={navLinkDayClick}
          dateClick={dateClick}
          datesSet={datesSet}
          dayCellContent={dayCellContent}
          views={VIEWS}
        />
      </div>
    </div>
  )
}
