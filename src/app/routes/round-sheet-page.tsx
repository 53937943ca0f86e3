import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Printer } from 'lucide-react'
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom'
import type { Person } from '#shared/schemas/person'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries, requireFacility } from '../../api/facility'
import { staffQueries } from '../../api/staff'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { roundSheetQueries, type SheetFilter } from '../../features/round-sheet/api/round-sheet-queries'
import { PrintSheet } from '../../features/round-sheet/components/print-sheet'
import { SheetModeTabs, parseSheetMode } from '../../features/round-sheet/components/sheet-mode-tabs'
import { SheetPicker } from '../../features/round-sheet/components/sheet-picker'
import { TypeInSheet } from '../../features/round-sheet/components/type-in-sheet'
import { todayIn } from '../../features/round-sheet/utils/sheet-format'
import '../../features/round-sheet/round-sheet-print.css'

const positive = (v: string | null) => (v && /^\d+$/.test(v) && Number(v) > 0 ? Number(v) : null)
const plans = (me: Person) => me.role === 'manager' || me.role === 'supervisor'

function filterFrom(search: URLSearchParams, me: Person, timeZone: string): SheetFilter {
  const date = /^\d{4}-\d{2}-\d{2}$/.test(search.get('date') ?? '') ? search.get('date')! : todayIn(timeZone)
  const areaId = positive(search.get('areaId'))
  const personId = positive(search.get('personId'))
  if (personId || !areaId) return { date, personId: personId ?? me.id, areaId: null }
  return { date, personId: null, areaId }
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const [me, facility] = await Promise.all([queryClient.ensureQueryData(authQueries.me()), queryClient.ensureQueryData(facilityQueries.facility())])
    const filter = filterFrom(new URL(request.url).searchParams, me, requireFacility(facility).timeZone)
    await Promise.all([
      queryClient.ensureQueryData(roundSheetQueries.sheet(filter)),
      queryClient.ensureQueryData(catalogueQueries.areas()),
      plans(me) ? queryClient.ensureQueryData(staffQueries.staff()) : null,
    ])
    return null
  }

export function Component() {
  const [search, setSearch] = useSearchParams()
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: facility } = useSuspenseQuery(facilityQueries.required())
  const { data: areas } = useSuspenseQuery(catalogueQueries.areas())
  const filter = filterFrom(search, me, facility.timeZone)
  const { data: round } = useSuspenseQuery(roundSheetQueries.sheet(filter))
  const staff = useQuery({ ...staffQueries.staff(), enabled: plans(me) })
  const people = plans(me) ? (staff.data ?? []).filter((p) => p.role !== 'observer') : [{ id: me.id, name: me.name }]
  const mode = parseSheetMode(search.get('mode'))
  const sheetFor = filter.areaId ? (areas.find((a) => a.id === filter.areaId)?.name ?? 'Area') : (people.find((p) => p.id === filter.personId)?.name ?? me.name)
  const go = (next: SheetFilter, nextMode = mode) => {
    const p = new URLSearchParams({ date: next.date })
    if (next.areaId) p.set('areaId', String(next.areaId))
    else if (next.personId) p.set('personId', String(next.personId))
    if (nextMode === 'enter') p.set('mode', 'enter')
    setSearch(p, { replace: true, preventScrollReset: true })
  }

  return (
    <section data-print-layout className="flex flex-col gap-4">
      <div className="print:hidden">
        <PageHeader title="Round sheet">
          {mode === 'print' && (
            <Button type="button" onClick={() => window.print()}>
              <Printer aria-hidden className="size-5" /> Print
            </Button>
          )}
        </PageHeader>
      </div>
      <SheetPicker filter={filter} people={people} areas={areas} onChange={(f) => go(f)} />
      <SheetModeTabs current={mode} onChange={(m) => go(filter, m)} />
      {mode === 'print' ? (
        <PrintSheet round={round} sheetFor={sheetFor} facilityName={facility.name} />
      ) : (
        <TypeInSheet round={round} people={people} defaultPersonId={filter.personId} />
      )}
    </section>
  )
}
