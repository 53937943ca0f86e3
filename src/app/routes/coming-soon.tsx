import { Hourglass } from 'lucide-react'
import { PageHeader } from '../../components/ui/page-state'

const PLANS: Record<string, { title: string; plan: string }> = {
  round: { title: 'Round', plan: "Your tasks for this shift, in walking order, with the readings each one needs. Completions are checked on the server, and the round keeps working offline." },
  board: { title: 'Board', plan: "One day's tasks in a column per person on shift. Supervisors drag cards to assign them or move them to another day; completions show up live." },
  calendar: { title: 'Calendar', plan: 'A month of workload per day: tasks done, open and missed, who is on shift and on call, and events such as arrivals and fasting windows.' },
  'on-call': { title: 'On call', plan: 'Who holds duty now and until when, this weekend’s tasks, open flags and escalations waiting for an answer, and handover notes.' },
  tanks: { title: 'Tanks', plan: 'The facility’s areas, systems, tanks and batches, each tank with its trend charts, limits, task history and a printable QR label.' },
  routines: { title: 'Routines', plan: 'The recurring care routines, each with its recurrence rule, targets, required readings and ladder, and a preview of the next dates.' },
  roster: { title: 'Roster', plan: 'Shifts and on-call duty per person, weekly patterns, a fair weekend rotation and warnings where cover is missing.' },
  reports: { title: 'Reports', plan: 'Compliance per day and week, response times to flags, and welfare-check records, exportable as CSV and printable.' },
}

export function ComingSoon({ area }: { area: keyof typeof PLANS }) {
  const { title, plan } = PLANS[area]
  return (
    <section>
      <PageHeader title={title} />
      <div className="flex max-w-xl gap-3 rounded-xl border border-tide-200 bg-white p-5">
        <Hourglass aria-hidden className="size-6 shrink-0 text-tide-500" />
        <div>
          <p className="font-semibold text-tide-900">Not built yet</p>
          <p className="mt-1 text-tide-700">{plan}</p>
        </div>
      </div>
    </section>
  )
}
