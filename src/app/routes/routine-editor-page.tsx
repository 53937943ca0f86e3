import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { ArrowLeft } from 'lucide-react'
import { Link, redirect, useNavigate, useParams, type LoaderFunctionArgs, type Params } from 'react-router-dom'
import type { Role } from '#shared/schemas/person'
import { facilityQueries } from '../../api/facility'
import { parameterQueries } from '../../api/parameters'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { routineQueries } from '../../features/routines/api/routine-queries'
import { DeleteRoutineButton } from '../../features/routines/components/delete-routine-button'
import { PausedLabel } from '../../features/routines/components/paused-label'
import { PriorityLabel } from '../../features/routines/components/priority-label'
import { RoutineForm } from '../../features/routines/components/routine-form'
import { RoutineUpcomingTasks } from '../../features/routines/components/routine-upcoming-tasks'

const canEditRoutines = (role: Role) => role === 'manager' || role === 'supervisor'

/** null on /routines/new; a 404 for anything that is not a routine id. */
function routineIdFrom(params: Params): number | null {
  if (params.id === undefined) return null
  const id = Number(params.id)
  if (!Number.isInteger(id) || id <= 0) throw new Response('Not found', { status: 404 })
  return id
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = routineIdFrom(params)
    const me = await queryClient.ensureQueryData(authQueries.me())
    if (id === null && !canEditRoutines(me.role)) return redirect('/routines')
    await Promise.all([
      queryClient.ensureQueryData(facilityQueries.facility()),
      queryClient.ensureQueryData(parameterQueries.parameters()),
      id === null ? null : queryClient.ensureQueryData(routineQueries.detail(id)),
    ])
    return null
  }

function useEditorContext() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: facility } = useSuspenseQuery(facilityQueries.required())
  const { data: parameters } = useSuspenseQuery(parameterQueries.parameters())
  return {
    timeZone: facility.timeZone,
    parameters,
    canEdit: canEditRoutines(me.role),
    canPickPerson: me.role === 'manager',
    canDelete: me.role === 'manager',
  }
}

const backLink = (
  <Link to="/routines" className="inline-flex min-h-11 items-center gap-1 self-start font-semibold text-tide-700 hover:underline">
    <ArrowLeft aria-hidden className="size-4" /> All routines
  </Link>
)

function NewRoutine() {
  const ctx = useEditorContext()
  const navigate = useNavigate()
  return (
    <section className="mx-auto flex w-full max-w-5xl flex-col gap-2">
      {backLink}
      <PageHeader title="New routine" />
      <RoutineForm {...ctx} onCreated={(saved) => navigate(`/routines/${saved.id}`, { replace: true })} />
    </section>
  )
}

function EditRoutine({ id }: { id: number }) {
  const ctx = useEditorContext()
  const navigate = useNavigate()
  const { data: routine } = useSuspenseQuery(routineQueries.detail(id))
  return (
    <section className="mx-auto flex w-full max-w-5xl flex-col gap-2">
      {backLink}
      <PageHeader title={routine.name}>
        <div className="flex flex-wrap gap-2">
          <PriorityLabel priority={routine.priority} />
          {routine.paused && <PausedLabel />}
        </div>
      </PageHeader>
      <div className="flex flex-col gap-6">
        <RoutineForm
          key={routine.id}
          {...ctx}
          routine={routine}
          onCreated={() => undefined}
          actions={ctx.canDelete && <DeleteRoutineButton routine={routine} onDeleted={() => navigate('/routines', { replace: true })} />}
        />
        <RoutineUpcomingTasks routineId={routine.id} timeZone={ctx.timeZone} paused={routine.paused} />
      </div>
    </section>
  )
}

export function Component() {
  const id = routineIdFrom(useParams())
  return id === null ? <NewRoutine /> : <EditRoutine key={id} id={id} />
}
