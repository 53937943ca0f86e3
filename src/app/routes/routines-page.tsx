import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Plus } from 'lucide-react'
import { Link, useSearchParams } from 'react-router-dom'
import { CategorySchema, type Category } from '#shared/schemas/routine'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { routineQueries } from '../../features/routines/api/routine-queries'
import { RoutineList } from '../../features/routines/components/routine-list'

export const loader = (queryClient: QueryClient) => () => queryClient.ensureQueryData(routineQueries.list())

export function Component() {
  const { data: routines } = useSuspenseQuery(routineQueries.list())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const [params, setParams] = useSearchParams()
  const category = CategorySchema.safeParse(params.get('category')).data ?? null
  const canEdit = me.role === 'manager' || me.role === 'supervisor'
  const setCategory = (next: Category | null) => setParams(next ? { category: next } : {}, { replace: true })

  return (
    <section className="flex flex-col gap-4">
      <PageHeader title="Routines">
        {canEdit && (
          <Link
            to="/routines/new"
            className="inline-flex min-h-11 items-center justify-center gap-2 rounded-lg bg-tide-700 px-4 font-semibold text-white hover:bg-tide-800"
          >
            <Plus aria-hidden className="size-5" /> New routine
          </Link>
        )}
      </PageHeader>
      <RoutineList routines={routines} category={category} onCategoryChange={setCategory} />
    </section>
  )
}
