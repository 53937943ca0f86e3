import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { useRef, useState } from 'react'
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom'
import type { Shift } from '#shared/schemas/roster'
import { facilityQueries, facilityZone } from '../../api/facility'
import { staffQueries } from '../../api/staff'
import { PageHeader } from '../../components/ui/page-state'
import { rosterQueries } from '../../features/roster/api/roster-queries'
import { CoverageWarnings } from '../../features/roster/components/coverage-warnings'
import { RosterGrid } from '../../features/roster/components/roster-grid'
import { RosterPlanner, type PlannerTab, type ShiftTarget } from '../../features/roster/components/roster-planner'
import { RosterToolbar } from '../../features/roster/components/roster-toolbar'
import { addDays, datesFrom, isMonday, mondayOf, todayIn } from '../../features/roster/utils/roster-dates'

function rangeFrom(params: URLSearchParams, timeZone: string) {
  const asked = params.get('from')
  const from = asked && isMonday(asked) ? asked : mondayOf(todayIn(timeZone))
  const days: 7 | 14 = params.get('days') === '14' ? 14 : 7
  return { from, days, to: addDays(from, days - 1) }
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const timeZone = facilityZone(await queryClient.ensureQueryData(facilityQueries.facility()))
    const { from, to } = rangeFrom(new URL(request.url).searchParams, timeZone)
    await Promise.all([
      queryClient.ensureQueryData(staffQueries.staff()),
      queryClient.ensureQueryData(rosterQueries.shifts(from, to)),
      queryClient.ensureQueryData(rosterQueries.duties(from, to)),
      queryClient.ensureQueryData(rosterQueries.coverage(from, to)),
    ])
    return null
  }

export function Component() {
  const { data: facility } = useSuspenseQuery(facilityQueries.facility())
  const timeZone = facilityZone(facility)
  const [params, setParams] = useSearchParams()
  const { from, days, to } = rangeFrom(params, timeZone)
  const today = todayIn(timeZone)
  const { data: staff } = useSuspenseQuery(staffQueries.staff())
  const { data: shifts } = useSuspenseQuery(rosterQueries.shifts(from, to))
  const { data: duties } = useSuspenseQuery(rosterQueries.duties(from, to))
  const { data: warnings } = useSuspenseQuery(rosterQueries.coverage(from, to))
  const [tab, setTab] = useState<PlannerTab>('shift')
  const [shiftTarget, setShiftTarget] = useState<ShiftTarget>({ shift: null, personId: null, date: from })
  const planner = useRef<HTMLElement>(null)

  const people = new Map(staff.filter((p) => p.role !== 'observer').map((p) => [p.id, p.name]))
  for (const row of [...shifts, ...duties]) if (!people.has(row.personId)) people.set(row.personId, row.personName)
  const rows = [...people].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name))

  const openShift = (target: ShiftTarget) => {
    setShiftTarget(target)
    setTab('shift')
    planner.current?.scrollIntoView({ behavior: 'smooth', block: 'start' })
  }
  const onEdit = (shift: Shift) => openShift({ shift, personId: shift.personId, date: shift.date })

  return (
    <section className="flex flex-col gap-4">
      <PageHeader title="Roster">
        <RosterToolbar
          from={from}
          days={days}
          thisMonday={mondayOf(today)}
          onChange={(nextFrom, nextDays) => setParams({ from: nextFrom, days: String(nextDays) }, { replace: true })}
        />
      </PageHeader>
      <CoverageWarnings warnings={warnings} />
      <RosterGrid
        dates={datesFrom(from, days)}
        today={today}
        people={rows}
        shifts={shifts}
        duties={duties}
        onAdd={(personId, date) => openShift({ shift: null, personId, date })}
        onEdit={onEdit}
      />
      <RosterPlanner
        ref={planner}
        tab={tab}
        onTab={setTab}
        shiftTarget={shiftTarget}
        onShiftDone={() => setShiftTarget({ shift: null, personId: null, date: from })}
        staff={staff}
        from={from}
        duties={duties}
        handoverTime={facility?.handoverTime ?? null}
      />
    </section>
  )
}
