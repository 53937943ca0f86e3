import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom'
import { Button } from '../../components/ui/button'
import { ErrorState } from '../../components/ui/page-state'
import { ApiError } from '../../lib/api-client'

/** One boundary for every route: not found, refused, offline, or a bug with its request id. */
export function RouteError() {
  const error = useRouteError()
  const status = isRouteErrorResponse(error) ? error.status : error instanceof ApiError ? error.status : 500
  if (status === 404) return <NotFound />
  if (status === 403) return <ErrorState title="Not for your role" message={(error as Error).message} />
  const message =
    error instanceof ApiError ? error.message + (error.requestId ? ` (request ${error.requestId})` : '') : 'Something went wrong while showing this page.'
  return (
    <ErrorState
      title="Could not load this page"
      message={message}
      action={
        <Button variant="secondary" onClick={() => window.location.reload()}>
          Try again
        </Button>
      }
    />
  )
}

export function NotFound() {
  return (
    <section className="m-4 max-w-md">
      <h1 className="text-2xl font-bold text-tide-900">Page not found</h1>
      <p className="mt-2 text-tide-700">There is nothing at this address. It may have moved, or the link may be mistyped.</p>
      <Link to="/" className="mt-4 inline-flex min-h-11 items-center font-semibold text-tide-700 underline">
        Go to the start page
      </Link>
    </section>
  )
}
