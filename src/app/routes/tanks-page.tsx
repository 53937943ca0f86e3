import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Eye } from 'lucide-react'
import { useSearchParams } from 'react-router-dom'
import type { Area, Batch, Equipment, System, Tank } from '#shared/schemas/facility'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { AreaForm } from '../../features/facility/components/area-form'
import { BatchForm } from '../../features/facility/components/batch-form'
import { BatchesTable } from '../../features/facility/components/batches-table'
import { CatalogueSection } from '../../features/facility/components/catalogue-section'
import { EquipmentForm } from '../../features/facility/components/equipment-form'
import { EquipmentTable } from '../../features/facility/components/equipment-table'
import { FacilityCounts } from '../../features/facility/components/facility-counts'
import { FacilitySettingsForm } from '../../features/facility/components/facility-settings-form'
import { FacilityTabs, parseFacilityTab } from '../../features/facility/components/facility-tabs'
import { FacilityTree } from '../../features/facility/components/facility-tree'
import { LimitsList } from '../../features/facility/components/limits-list'
import { SystemForm } from '../../features/facility/components/system-form'
import { SystemsTable } from '../../features/facility/components/systems-table'
import { TankForm } from '../../features/facility/components/tank-form'
import { TankImportPanel } from '../../features/facility/components/tank-import-panel'
import { TanksTable } from '../../features/facility/components/tanks-table'

export const loader = (queryClient: QueryClient) => async () => {
  await Promise.all([
    queryClient.ensureQueryData(facilityQueries.facility()),
    queryClient.ensureQueryData(catalogueQueries.areas()),
    queryClient.ensureQueryData(catalogueQueries.systems()),
    queryClient.ensureQueryData(catalogueQueries.tanks()),
    queryClient.ensureQueryData(catalogueQueries.equipment()),
    queryClient.ensureQueryData(catalogueQueries.batches()),
  ])
  return null
}

export function Component() {
  const [params] = useSearchParams()
  const tab = parseFacilityTab(params.get('tab'))
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: facility } = useSuspenseQuery(facilityQueries.facility())
  const { data: areas } = useSuspenseQuery(catalogueQueries.areas())
  const { data: systems } = useSuspenseQuery(catalogueQueries.systems())
  const { data: tanks } = useSuspenseQuery(catalogueQueries.tanks())
  const { data: equipment } = useSuspenseQuery(catalogueQueries.equipment())
  const { data: batches } = useSuspenseQuery(catalogueQueries.batches())
  const isManager = me.role === 'manager'
  const canEditBatches = isManager || me.role === 'supervisor'
  const nextRoundOrder = areas.reduce((max, a) => Math.max(max, a.roundOrder + 10), 10)

  return (
    <section className="flex flex-col gap-4">
      <PageHeader title="Tanks">
        {facility && (
          <p className="text-sm text-tide-700">
            {facility.name} · {facility.timeZone}
          </p>
        )}
      </PageHeader>
      <FacilityTabs current={tab} />
      {!isManager && (
        <p className="flex items-center gap-2 text-sm text-tide-700">
          <Eye aria-hidden className="size-4" /> Read-only: managers change the facility structure{canEditBatches ? '; you can edit batches.' : '.'}
        </p>
      )}

      {tab === 'overview' && (
        <CatalogueSection<Area>
          title="Areas, systems and tanks"
          description="Areas in the order a round walks them: clean areas first, quarantine last."
          addLabel="Add area"
          canEdit={isManager}
          renderForm={(area, done) => <AreaForm area={area} nextRoundOrder={nextRoundOrder} onDone={done} />}
        >
          {(edit) => (
            <>
              <FacilityCounts areas={areas} systems={systems} tanks={tanks} />
              <FacilityTree areas={areas} systems={systems} tanks={tanks} equipment={equipment} canEdit={isManager} onEditArea={edit} />
            </>
          )}
        </CatalogueSection>
      )}
      {tab === 'tanks' && (
        <CatalogueSection<Tank>
          title="Tanks and bins"
          addLabel="Add tank"
          canEdit={isManager}
          renderForm={(tank, done) => <TankForm tank={tank} areas={areas} systems={systems} onDone={done} />}
          after={isManager && <TankImportPanel />}
        >
          {(edit) => <TanksTable tanks={tanks} areas={areas} systems={systems} canEdit={isManager} onEdit={edit} />}
        </CatalogueSection>
      )}
      {tab === 'systems' && (
        <CatalogueSection<System>
          title="Systems"
          description="Recirculating loops that share water between tanks. Limits can differ per system."
          addLabel="Add system"
          canEdit={isManager}
          renderForm={(system, done) => <SystemForm system={system} areas={areas} onDone={done} />}
        >
          {(edit) => <SystemsTable systems={systems} areas={areas} tanks={tanks} canEdit={isManager} onEdit={edit} />}
        </CatalogueSection>
      )}
      {tab === 'equipment' && (
        <CatalogueSection<Equipment>
          title="Equipment"
          description="Pumps, blowers, filters and probes that routines check and maintain."
          addLabel="Add equipment"
          canEdit={isManager}
          renderForm={(item, done) => <EquipmentForm equipment={item} areas={areas} onDone={done} />}
        >
          {(edit) => <EquipmentTable equipment={equipment} areas={areas} canEdit={isManager} onEdit={edit} />}
        </CatalogueSection>
      )}
      {tab === 'batches' && (
        <CatalogueSection<Batch>
          title="Batches"
          description="Lots of fish, the tanks that hold them, and where they stand: quarantine, active, dispatched or ended."
          addLabel="Add batch"
          canEdit={canEditBatches}
          renderForm={(batch, done) => <BatchForm batch={batch} tanks={tanks} onDone={done} />}
        >
          {(edit) => <BatchesTable batches={batches} tanks={tanks} canEdit={canEditBatches} onEdit={edit} />}
        </CatalogueSection>
      )}
      {tab === 'settings' && (
        <div className="flex flex-col gap-6">
          <section aria-labelledby="facility-settings-title" className="flex flex-col gap-3">
            <h2 id="facility-settings-title" className="text-xl font-bold text-tide-900">
              Facility settings
            </h2>
            {facility ? (
              <FacilitySettingsForm facility={facility} canEdit={isManager} />
            ) : (
              <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
                This database has no facility record yet. Run the seed on the server (npm run seed) to create it, then come back here.
              </p>
            )}
          </section>
          <section aria-labelledby="limits-title" className="flex flex-col gap-3">
            <h2 id="limits-title" className="text-xl font-bold text-tide-900">
              Reading limits
            </h2>
            <p className="max-w-2xl text-sm text-tide-700">
              A reading inside the ok range is ok; outside it is watch; past a critical limit it is critical and escalates at once.
            </p>
            <LimitsList systems={systems} batches={batches} />
          </section>
        </div>
      )}
    </section>
  )
}
