import { useQuery, useQueryClient } from '@tanstack/react-query'
import type { Person } from '#shared/schemas/person'
import { catalogueQueries } from '../../api/catalogues'
import { stockQueries } from '../../api/stock'
import { QueryState } from '../../components/ui/query-state'
import { tankPageKeys } from '../../features/tank-page/api/tank-page-queries'
import { MovementForm } from '../../features/stock-register/components/movement-form'
import { StockRegisterSection } from '../../features/stock-register/components/stock-register-section'

/** The tank page's stock register: fish in this tank per batch, its movements, and the form to add one. */
export function TankStock({ tankId, me, timeZone }: { tankId: number; me: Person; timeZone: string }) {
  const queryClient = useQueryClient()
  const stock = useQuery(stockQueries.tank(tankId))
  const movements = useQuery(stockQueries.movements({ tankId }))
  const settings = useQuery(stockQueries.settings())
  const tanks = useQuery(catalogueQueries.tanks())
  const batches = useQuery(catalogueQueries.batches())
  return (
    <QueryState queries={[stock, movements, settings, tanks, batches]} what="the stock register">
      {() => {
        const here = stock.data!
        const live = batches.data!.filter((b) => b.status !== 'ended' || here.batches.some((h) => h.batchId === b.id))
        const form =
          me.role === 'observer' ? null : (
            <MovementForm
              role={me.role}
              timeZone={timeZone}
              batches={live.map((b) => ({ id: b.id, label: `${b.code} · ${b.species}` }))}
              tanks={tanks.data!.map((t) => ({ id: t.id, label: `${t.code} · ${t.name}` }))}
              causes={settings.data!.mortalityCauses}
              movements={movements.data!}
              start={{
                batchId: here.batches[0] ? String(here.batches[0].batchId) : '',
                fromTankId: String(tankId),
                toTankId: String(tankId),
                tankId: String(tankId),
              }}
              onRecorded={() => void queryClient.invalidateQueries({ queryKey: tankPageKeys.overview(tankId) })}
            />
          )
        return (
          <StockRegisterSection
            figures={here}
            rows={here.batches.map((b) => ({ ...b, key: b.batchId, label: `Batch ${b.batchCode}`, to: `/batches/${b.batchId}` }))}
            rowsLabel="Batch"
            emptyText="The register shows no fish in this tank."
            movements={movements.data!}
            view={{ tankId }}
            timeZone={timeZone}
            form={form}
          />
        )
      }}
    </QueryState>
  )
}
