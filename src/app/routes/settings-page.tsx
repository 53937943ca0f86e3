import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { facilityQueries } from '../../api/facility'
import { staffQueries } from '../../api/staff'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { escalationQueries } from '../../features/escalation/api/escalation-queries'
import { LadderEditor } from '../../features/escalation/components/ladder-editor'
import { PreferencesForm } from '../../features/escalation/components/preferences-form'
import { PushDeviceControl } from '../../features/escalation/components/push-device-control'

export const loader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(authQueries.me())
  await Promise.all([
    queryClient.ensureQueryData(escalationQueries.preferences()),
    queryClient.ensureQueryData(facilityQueries.timeZone()),
    me.role === 'manager' && queryClient.ensureQueryData(escalationQueries.ladders()),
    me.role === 'manager' && queryClient.ensureQueryData(staffQueries.staff()),
  ])
  return null
}

function Ladders() {
  const { data: ladders } = useSuspenseQuery(escalationQueries.ladders())
  const { data: staff } = useSuspenseQuery(staffQueries.staff())
  return (
    <section aria-labelledby="ladders-heading" className="flex flex-col gap-3">
      <div>
        <h2 id="ladders-heading" className="text-xl font-bold text-tide-900">Escalation ladders</h2>
        <p className="text-sm text-tide-700">Each step says how many minutes after a missed task or critical reading it goes out, and whom it notifies. Acknowledging stops the ladder.</p>
      </div>
      <LadderEditor ladders={ladders} staff={staff} />
    </section>
  )
}

export function Component() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: preferences } = useSuspenseQuery(escalationQueries.preferences())
  const { data: timeZone } = useSuspenseQuery(facilityQueries.timeZone())
  return (
    <section className="mx-auto flex w-full max-w-3xl flex-col gap-6">
      <PageHeader title="Settings" />
      <section aria-labelledby="prefs-heading" className="flex flex-col gap-3">
        <h2 id="prefs-heading" className="text-xl font-bold text-tide-900">How escalations reach me</h2>
        <PreferencesForm preferences={preferences} timeZone={timeZone} />
        <PushDeviceControl available={preferences.available.push} accepted={preferences.channels.includes('push')} />
      </section>
      {me.role === 'manager' && <Ladders />}
    </section>
  )
}
