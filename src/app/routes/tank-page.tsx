import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { useParams, useSearchParams, type LoaderFunctionArgs, type Params } from 'react-router-dom'
import { facilityQueries } from '../../api/facility'
import { stockQueries } from '../../api/stock'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { TREND_RANGES, tankPageQueries, type TrendRange } from '../../features/tank-page/api/tank-page-queries'
import { BatchHistory } from '../../features/tank-page/components/batch-history'
import { EventList } from '../../features/tank-page/components/event-list'
import { LimitsTable } from '../../features/tank-page/components/limits-table'
import { PageSection } from '../../features/tank-page/components/page-section'
import { RecentTasks } from '../../features/tank-page/components/recent-tasks'
import { TankSummary } from '../../features/tank-page/components/tank-summary'
import { TrendsSection } from '../../features/tank-page/components/trends-section'
import { defaultSelection, trendParameters } from '../../features/tank-page/utils/trend-series'
import { TankStock } from '../stock/tank-stock'

function tankIdFrom(params: Params): number {
  const id = Number(params.id)
  if (!Number.isInteger(id) || id <= 0) throw new Response('Not found', { status: 404 })
  return id
}

const daysFrom = (search: URLSearchParams): TrendRange => TREND_RANGES.find((d) => String(d) === search.get('days')) ?? 30

export const loader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const id = tankIdFrom(params)
    // The stock register loads beside the page (its own loading and error states), so it is not awaited.
    void queryClient.prefetchQuery(stockQueries.tank(id))
    void queryClient.prefetchQuery(stockQueries.movements({ tankId: id }))
    await Promise.all([
      queryClient.ensureQueryData(tankPageQueries.overview(id)),
      queryClient.ensureQueryData(tankPageQueries.readings(id, daysFrom(new URL(request.url).searchParams))),
      queryClient.ensureQueryData(facilityQueries.facility()),
    ])
    return null
  }

export function Component() {
  const id = tankIdFrom(useParams())
  const [search, setSearch] = useSearchParams()
  const days = daysFrom(search)
  const { data: overview } = useSuspenseQuery(tankPageQueries.overview(id))
  const { data: readings } = useSuspenseQuery(tankPageQueries.readings(id, days))
  const { data: timeZone } = useSuspenseQuery(facilityQueries.timeZone())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const parameters = trendParameters(overview.limits, readings.tank, readings.system)
  const shown = search.get('show')
  const selected = shown === null ? defaultSelection(parameters) : shown.split(',').filter(Boolean)
  const update = (key: string, value: string) =>
    setSearch(
      (current) => {
        const next = new URLSearchParams(current)
        next.set(key, value)
        return next
      },
      { replace: true, preventScrollReset: true },
    )
  const systemLabel = overview.system ? `System ${overview.system.code}` : null

  return (
    <section className="mx-auto flex w-full max-w-6xl flex-col gap-5">
      <PageHeader title={`${overview.tank.code} · ${overview.tank.name}`} />
      <TankSummary overview={overview} />
      <TankStock tankId={id} me={me} timeZone={timeZone} />
      <TrendsSection
        readings={readings}
        parameters={parameters}
        selected={selected}
        days={days}
        timeZone={timeZone}
        systemLabel={systemLabel}
        onDaysChange={(d) => update('days', String(d))}
        onSelectedChange={(keys) => update('show', keys.join(','))}
      />
      <div className="grid gap-5 lg:grid-cols-2">
        <PageSection title="Recent tasks">
          <RecentTasks tasks={overview.recentTasks} />
        </PageSection>
        <PageSection title="Limits here">
          <LimitsTable limits={overview.limits} />
        </PageSection>
        <PageSection title="Batches">
          <BatchHistory overview={overview} timeZone={timeZone} />
        </PageSection>
        <PageSection title="Events">
          <EventList events={overview.events} />
        </PageSection>
      </div>
    </section>
  )
}
