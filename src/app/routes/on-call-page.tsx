import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { facilityQueries } from '../../api/facility'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { onCallQueries } from '../../features/on-call/api/on-call-queries'
import { DutyHolderCard } from '../../features/on-call/components/duty-holder-card'
import { HandoverNotes } from '../../features/on-call/components/handover-notes'
import { OpenFlagsList } from '../../features/on-call/components/open-flags-list'
import { WaitingEscalations } from '../../features/on-call/components/waiting-escalations'
import { WeekendTasks } from '../../features/on-call/components/weekend-tasks'

export const loader = (queryClient: QueryClient) => () =>
  Promise.all([queryClient.ensureQueryData(onCallQueries.summary()), queryClient.ensureQueryData(facilityQueries.timeZone())])

export function Component() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: summary } = useSuspenseQuery(onCallQueries.summary())
  const { data: timeZone } = useSuspenseQuery(facilityQueries.timeZone())
  const canPlan = me.role === 'manager' || me.role === 'supervisor'
  const notObserver = me.role !== 'observer'

  return (
    <section className="mx-auto flex w-full max-w-5xl flex-col gap-4">
      <PageHeader title="On call" />
      <div className="grid gap-4 lg:grid-cols-2 lg:items-start">
        <div className="flex flex-col gap-4">
          <DutyHolderCard now={summary.now} next={summary.next} timeZone={timeZone} canPlan={canPlan} />
          <WaitingEscalations alerts={summary.alerts} timeZone={timeZone} canAcknowledge={notObserver} />
          <OpenFlagsList flags={summary.openFlags} timeZone={timeZone} />
        </div>
        <div className="flex flex-col gap-4">
          <HandoverNotes notes={summary.notes} timeZone={timeZone} canWrite={notObserver} />
          <WeekendTasks {...summary.weekend} />
        </div>
      </div>
    </section>
  )
}
