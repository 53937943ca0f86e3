import type { QueryClient } from '@tanstack/react-query'
import type { LoaderFunctionArgs } from 'react-router-dom'
import { roundQueries } from '../../features/round/api/round-queries'

export const dateFrom = (params: URLSearchParams) => {
  const date = params.get('date')
  return date && /^\d{4}-\d{2}-\d{2}$/.test(date) ? date : null
}

// A module apart from the page, so the round's request goes out while the page's code still loads.
// Not awaited: the page shows its own loading, offline and error states instead of blocking navigation.
export const loader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(roundQueries.day(dateFrom(new URL(request.url).searchParams)))
    return null
  }
