import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Printer } from 'lucide-react'
import { useSearchParams } from 'react-router-dom'
import { catalogueQueries } from '../../api/catalogues'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { LabelPicker, type LabelChoice } from '../../features/labels/components/label-picker'
import { LabelSheet } from '../../features/labels/components/label-sheet'
import '../../features/labels/labels-print.css'

const positive = (v: string | null) => (v && /^\d+$/.test(v) && Number(v) > 0 ? Number(v) : null)

function choiceFrom(search: URLSearchParams): LabelChoice {
  const areaId = positive(search.get('areaId'))
  return areaId && !search.get('tankId') ? { kind: 'area', id: areaId } : { kind: 'tank', id: positive(search.get('tankId')) }
}

export const loader = (queryClient: QueryClient) => async () => {
  await Promise.all([queryClient.ensureQueryData(catalogueQueries.tanks()), queryClient.ensureQueryData(catalogueQueries.areas())])
  return null
}

export function Component() {
  const [search, setSearch] = useSearchParams()
  const { data: tanks } = useSuspenseQuery(catalogueQueries.tanks())
  const { data: areas } = useSuspenseQuery(catalogueQueries.areas())
  const choice = choiceFrom(search)
  const sorted = [...tanks].sort((a, b) => a.code.localeCompare(b.code))
  const shown = choice.id === null ? [] : choice.kind === 'area' ? sorted.filter((t) => t.areaId === choice.id) : sorted.filter((t) => t.id === choice.id)
  const choose = (next: LabelChoice) => setSearch(next.id === null ? {} : { [next.kind === 'area' ? 'areaId' : 'tankId']: String(next.id) }, { replace: true })

  return (
    <section data-print-layout className="flex flex-col gap-4">
      <div className="print:hidden">
        <PageHeader title="QR labels">
          <Button type="button" onClick={() => window.print()} disabled={shown.length === 0}>
            <Printer aria-hidden className="size-5" /> Print
          </Button>
        </PageHeader>
        <p className="max-w-2xl text-tide-800">
          Stick a label on each tank. Scanning its code with a phone opens the tank’s page in Roundtide: trends, limits and its tasks.
        </p>
      </div>
      <LabelPicker choice={choice} tanks={sorted} areas={areas} onChange={choose} />
      {choice.id === null ? <p className="text-tide-700 print:hidden">Choose a tank or an area to make labels.</p> : <LabelSheet tanks={shown} areas={areas} />}
    </section>
  )
}
