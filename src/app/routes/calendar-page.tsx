import { useCallback, useState } from 'react'
import { useNavigate, useSearchParams } from 'react-router-dom'
import { PageHeader } from '../../components/ui/page-state'
import { WorkloadCalendar } from '../../features/calendar/components/workload-calendar'
import type { CalendarViewName } from '../../features/calendar/utils/calendar-dates'

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/

export function Component() {
  const [params, setParams] = useSearchParams()
  const navigate = useNavigate()
  // Read once: afterwards the calendar owns the date and reports it back into the address.
  const [initial] = useState(() => {
    const date = params.get('date')
    return { date: date && ISO_DATE.test(date) ? date : null, view: (params.get('view') === 'week' ? 'week' : 'month') as CalendarViewName }
  })
  const onOpenDay = useCallback((date: string) => navigate(`/board?date=${date}`), [navigate])
  const onShown = useCallback((date: string, view: CalendarViewName) => setParams(view === 'week' ? { date, view } : { date }, { replace: true }), [setParams])
  return (
    <section className="flex flex-col">
      <PageHeader title="Calendar" />
      <WorkloadCalendar initialDate={initial.date} initialView={initial.view} onOpenDay={onOpenDay} onShown={onShown} />
    </section>
  )
}
