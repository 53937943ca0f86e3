import type { QueryClient } from '@tanstack/react-query'
import { redirect, type LoaderFunctionArgs } from 'react-router-dom'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { boardQueries } from '../../features/board/api/board-queries'
import { ISO_DATE } from '../../features/board/utils/board-dates'

/** Today on the facility's clock (the browser's own when no facility is set up yet). */
export function todayIn(timeZone: string | undefined) {
  return dayFormatter(timeZone).format(new Date())
}

// One formatter per zone: building one costs milliseconds, and the board asks on every render.
const formatters = new Map<string | undefined, Intl.DateTimeFormat>()
function dayFormatter(timeZone: string | undefined) {
  let f = formatters.get(timeZone)
  if (!f) formatters.set(timeZone, (f = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' })))
  return f
}

const facilityToday = async (queryClient: QueryClient) => todayIn((await queryClient.ensureQueryData(facilityQueries.facility()))?.timeZone)

// A module apart from the page (and its drag-and-drop code), so the day's cards are requested while the page's code still loads.
export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const url = new URL(request.url)
    const date = url.searchParams.get('date')
    if (!date || !ISO_DATE.test(date)) {
      url.searchParams.set('date', await facilityToday(queryClient))
      throw redirect(`${url.pathname}?${url.searchParams}`)
    }
    void queryClient.prefetchQuery(catalogueQueries.areas())
    await queryClient.ensureQueryData(boardQueries.day(date))
    return null
  }
