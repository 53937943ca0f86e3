import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Calculator, Plus } from 'lucide-react'
import { useState } from 'react'
import { Link } from 'react-router-dom'
import { facilityQueries } from '../../api/facility'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { oxygenQueries } from '../../features/oxygen/api/oxygen-queries'
import { AddCylinderForm } from '../../features/oxygen/components/add-cylinder-form'
import { CylinderCard } from '../../features/oxygen/components/cylinder-card'

export const loader = (queryClient: QueryClient) => async () => {
  await Promise.all([queryClient.ensureQueryData(oxygenQueries.cylinders()), queryClient.ensureQueryData(facilityQueries.facility())])
  return null
}

export function Component() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: cylinders } = useSuspenseQuery(oxygenQueries.cylinders())
  const { data: facility } = useSuspenseQuery(facilityQueries.required())
  const [adding, setAdding] = useState(false)
  const canAdd = me.role === 'manager' || me.role === 'supervisor'

  return (
    <section className="mx-auto flex w-full max-w-4xl flex-col gap-4">
      <PageHeader title="Oxygen supply">
        {canAdd && !adding && (
          <Button variant="secondary" onClick={() => setAdding(true)}>
            <Plus aria-hidden className="size-5" /> Add cylinder
          </Button>
        )}
      </PageHeader>
      <p className="text-tide-700">
        Below {facility.minOxygenHours} h to the reserve pressure a cylinder is low and a replace task goes on the board; below a quarter of that it is critical
        and escalates.
      </p>
      {adding && <AddCylinderForm onDone={() => setAdding(false)} />}
      {cylinders.length === 0 ? (
        <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No cylinders or banks are set up yet.</p>
      ) : (
        <ul aria-label="Cylinders" className="flex flex-col gap-3">
          {cylinders.map((c) => (
            <CylinderCard key={c.id} cylinder={c} zone={facility.timeZone} canRead={me.role !== 'observer'} />
          ))}
        </ul>
      )}
      <Link to="/calculators?tool=cylinder" className="inline-flex min-h-11 items-center gap-2 self-start font-semibold text-tide-700 underline">
        <Calculator aria-hidden className="size-4" /> Cylinder calculator
      </Link>
    </section>
  )
}
