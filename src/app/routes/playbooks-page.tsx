import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Play } from 'lucide-react'
import { useState } from 'react'
import { useNavigate } from 'react-router-dom'
import { toast } from 'sonner'
import { catalogueQueries as refs } from '../../api/catalogues'
import { facilityQueries, facilityZone } from '../../api/facility'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { playbookQueries } from '../../features/playbooks/api/playbook-queries'
import { EventList } from '../../features/playbooks/components/event-list'
import { PlaybookLibrary } from '../../features/playbooks/components/playbook-library'
import { StartEventForm } from '../../features/playbooks/components/start-event-form'
import { addDays, todayIn } from '../../features/playbooks/utils/zone-format'

// Running events (a 30-day quarantine) started weeks ago still matter; a year ahead covers planning.
const eventRange = (zone: string) => {
  const today = todayIn(zone)
  return { from: addDays(today, -60), to: addDays(today, 365) }
}

export const loader = (queryClient: QueryClient) => async () => {
  const [facility] = await Promise.all([
    queryClient.ensureQueryData(facilityQueries.facility()),
    queryClient.ensureQueryData(playbookQueries.list()),
    queryClient.ensureQueryData(refs.tanks()),
    queryClient.ensureQueryData(refs.areas()),
    queryClient.ensureQueryData(refs.batches()),
  ])
  const { from, to } = eventRange(facilityZone(facility))
  await queryClient.ensureQueryData(playbookQueries.events(from, to))
  return null
}

export function Component() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: zone } = useSuspenseQuery(facilityQueries.timeZone())
  const { data: playbooks } = useSuspenseQuery(playbookQueries.list())
  const { data: tanks } = useSuspenseQuery(refs.tanks())
  const { data: areas } = useSuspenseQuery(refs.areas())
  const { data: batches } = useSuspenseQuery(refs.batches())
  const [range] = useState(() => eventRange(zone))
  const { data: events } = useSuspenseQuery(playbookQueries.events(range.from, range.to))
  const [starting, setStarting] = useState(false)
  const navigate = useNavigate()
  const canPlan = me.role === 'manager' || me.role === 'supervisor'

  return (
    <section className="mx-auto flex w-full max-w-6xl flex-col gap-8">
      <div className="flex flex-col gap-3">
        <PageHeader title="Playbooks & events">
          {canPlan && !starting && playbooks.length > 0 && (
            <Button onClick={() => setStarting(true)}>
              <Play aria-hidden className="size-5" /> Start event
            </Button>
          )}
        </PageHeader>
        {starting && (
          <StartEventForm
            playbooks={playbooks}
            tanks={tanks}
            areas={areas}
            batches={batches}
            zone={zone}
            onClose={() => setStarting(false)}
            onStarted={(event) => {
              toast.success(`Started “${event.title}” with ${event.taskCount} tasks.`)
              navigate(`/events/${event.id}`)
            }}
          />
        )}
        <h2 className="text-xl font-bold text-tide-900">Events</h2>
        <EventList events={events} tanks={tanks} batches={batches} zone={zone} canManage={canPlan} />
      </div>
      <PlaybookLibrary playbooks={playbooks} canEdit={me.role === 'manager'} />
    </section>
  )
}
