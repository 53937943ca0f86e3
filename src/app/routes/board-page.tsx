import { useQuery, useSuspenseQuery } from '@tanstack/react-query'
import { Loader2 } from 'lucide-react'
import { useNavigation, useSearchParams } from 'react-router-dom'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { boardQueries } from '../../features/board/api/board-queries'
import { BoardView } from '../../features/board/components/board-view'
import { fullDay } from '../../features/board/utils/board-dates'
import { todayIn } from './board-loader'

export function Component() {
  const [params] = useSearchParams()
  const date = params.get('date')!
  const { data: board } = useSuspenseQuery(boardQueries.day(date))
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: facility } = useQuery(facilityQueries.facility())
  const { data: areas = [] } = useQuery(catalogueQueries.areas())
  const navigation = useNavigation()
  const loadingDay = navigation.state === 'loading' && navigation.location.pathname === '/board'

  return (
    <section className="flex flex-col">
      <PageHeader title="Board">
        <p className="flex items-center gap-2 text-lg font-semibold text-tide-800">
          {loadingDay && <Loader2 aria-label="Loading the day" className="size-5 animate-spin" />}
          {fullDay(board.date)}
        </p>
      </PageHeader>
      <BoardView key={board.date} board={board} areas={areas} today={todayIn(facility?.timeZone)} canEdit={me.role === 'manager' || me.role === 'supervisor'} />
    </section>
  )
}
