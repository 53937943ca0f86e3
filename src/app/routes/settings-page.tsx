import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { facilityQueries } from '../../api/facility'
import { staffQueries } from '../../api/staff'
import { stockQueries } from '../../api/stock'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { escalationQueries } from '../../features/escalation/api/escalation-queries'
import { LadderEditor } from '../../features/escalation/components/ladder-editor'
import { PreferencesForm } from '../../features/escalation/components/preferences-form'
import { PushDeviceControl } from '../../features/escalation/components/push-device-control'
import { AnimalRecordSettingsForm } from '../../features/stock-register/components/animal-record-settings-form'

export const loader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(authQueries.me())
  await Promise.all([
    queryClient.ensureQueryData(escalationQueries.preferences()),
    queryClient.ensureQueryData(facilityQueries.timeZone()),
    me.role === 'manager' && queryClient.ensureQueryData(escalationQueries.ladders()),
    me.role === 'manager' && queryClient.ensureQueryData(staffQueries.staff()),
    me.role === 'manager' && queryClient.ensureQueryData(stockQueries.settings()),
  ])
  return null
}

function Ladders() {
  const { data: ladders } = useSuspenseQuery(escalationQueries.ladders())
  const { data: staff } = useSuspenseQuery(staffQueries.staff())
  return (
    <section aria-labelledby="ladders-heading" className="flex flex-col gap-3">
      <div>
        <h2 id="ladders-heading" className="text-xl font-bold text-tide-900">
          Escalation ladders
        </h2>
        <p className="text-sm text-tide-700">
          Each step says how many minutes after a missed task or critical reading it goes out, and whom it notifies. Acknowledging stops the ladder.
        </p>
      </div>
      <LadderEditor ladders={ladders} staff={staff} />
    </section>
  )
}

function AnimalRecord() {
  const { data: settings } = useSuspenseQuery(stockQueries.settings())
  return (
    <section aria-labelledby="animal-record-heading" className="flex flex-col gap-3">
      <div>
        <h2 id="animal-record-heading" className="text-xl font-bold text-tide-900">
          Animal record
        </h2>
        <p className="text-sm text-tide-700">
          Causes of death offered on the round, when losses raise a flag and an incident proposal, and the deadlines an incident carries.
        </p>
      </div>
      <AnimalRecordSettingsForm settings={settings} />
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
        <h2 id="prefs-heading" className="text-xl font-bold text-tide-900">
          How escalations reach me
        </h2>
        <PreferencesForm preferences={preferences} timeZone={timeZone} />
        <PushDeviceControl available={preferences.available.push} accepted={preferences.channels.includes('push')} />
      </section>
      {me.role === 'manager' && <Ladders />}
      {me.role === 'manager' && <AnimalRecord />}
    </section>
  )
}
