import { useQuery, useQueryClient } from '@tanstack/react-query'
import type { Person } from '#shared/schemas/person'
import { catalogueQueries } from '../../api/catalogues'
import { stockQueries } from '../../api/stock'
import { QueryState } from '../../components/ui/query-state'
import { batchRecordKeys } from '../../features/batch-record/api/batch-record-queries'
import { MovementForm } from '../../features/stock-register/components/movement-form'
import { StockRegisterSection } from '../../features/stock-register/components/stock-register-section'

/** The batch page's stock register: the batch's fish per tank, its movements, and the form to add one. */
export function BatchStock({ batchId, me, timeZone }: { batchId: number; me: Person; timeZone: string }) {
  const queryClient = useQueryClient()
  const stock = useQuery(stockQueries.batch(batchId))
  const movements = useQuery(stockQueries.movements({ batchId }))
  const settings = useQuery(stockQueries.settings())
  const tanks = useQuery(catalogueQueries.tanks())
  return (
    <QueryState queries={[stock, movements, settings, tanks]} what="the stock register">
      {() => {
        const here = stock.data!
        const mostFish = [...here.tanks].sort((a, b) => b.count - a.count)[0]
        const tankId = mostFish ? String(mostFish.tankId) : ''
        const form =
          me.role === 'observer' ? null : (
            <MovementForm
              role={me.role}
              timeZone={timeZone}
              batches={[{ id: batchId, label: here.batchCode }]}
              tanks={tanks.data!.map((t) => ({ id: t.id, label: `${t.code} · ${t.name}` }))}
              causes={settings.data!.mortalityCauses}
              movements={movements.data!}
              start={{ kind: here.onRegister || me.role === 'technician' ? 'mortality' : 'arrival', batchId: String(batchId), fromTankId: tankId, tankId }}
              onRecorded={() => void queryClient.invalidateQueries({ queryKey: batchRecordKeys.batch(batchId) })}
            />
          )
        return (
          <StockRegisterSection
            figures={here}
            rows={here.tanks.map((t) => ({ ...t, key: t.tankId, label: t.tankCode, to: `/tanks/${t.tankId}` }))}
            rowsLabel="Tank"
            emptyText={
              here.onRegister ? 'The register shows none of this batch left in any tank.' : 'This batch is not on the stock register yet: record its arrival.'
            }
            movements={movements.data!}
            view={{ batchId }}
            timeZone={timeZone}
            form={form}
          />
        )
      }}
    </QueryState>
  )
}
