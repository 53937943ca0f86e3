import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { CalendarRange } from 'lucide-react'
import { Link, useParams, useSearchParams, type LoaderFunctionArgs, type Params } from 'react-router-dom'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { stockQueries } from '../../api/stock'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { batchRecordQueries } from '../../features/batch-record/api/batch-record-queries'
import { BatchSummary } from '../../features/batch-record/components/batch-summary'
import { BathRecordForm } from '../../features/batch-record/components/bath-record-form'
import { NoteForm } from '../../features/batch-record/components/note-form'
import { RECORD_FORMS, RecordFormPicker, type RecordFormName } from '../../features/batch-record/components/record-form-picker'
import { RecordList } from '../../features/batch-record/components/record-list'
import { TransportBoxForm } from '../../features/batch-record/components/transport-box-form'
import { TransportWaterForm } from '../../features/batch-record/components/transport-water-form'
import { WeighingForm } from '../../features/batch-record/components/weighing-form'
import { BatchStock } from '../stock/batch-stock'

const positiveId = (value: string | null | undefined) => {
  const id = Number(value)
  return Number.isInteger(id) && id > 0 ? id : null
}

function batchIdFrom(params: Params): number {
  const id = positiveId(params.id)
  if (id === null) throw new Response('Not found', { status: 404 })
  return id
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = batchIdFrom(params)
    // The stock register loads beside the page (its own loading and error states), so it is not awaited.
    void queryClient.prefetchQuery(stockQueries.batch(id))
    void queryClient.prefetchQuery(stockQueries.movements({ batchId: id }))
    await Promise.all([
      queryClient.ensureQueryData(batchRecordQueries.batch(id)),
      queryClient.ensureQueryData(batchRecordQueries.records(id)),
      queryClient.ensureQueryData(facilityQueries.facility()),
      queryClient.ensureQueryData(catalogueQueries.tanks()),
    ])
    return null
  }

export function Component() {
  const id = batchIdFrom(useParams())
  const [params, setParams] = useSearchParams()
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: batch } = useSuspenseQuery(batchRecordQueries.batch(id))
  const { data: records } = useSuspenseQuery(batchRecordQueries.records(id))
  const { data: facility } = useSuspenseQuery(facilityQueries.required())
  const { data: tanks } = useSuspenseQuery(catalogueQueries.tanks())
  const eventId = positiveId(params.get('event'))
  const form: RecordFormName = RECORD_FORMS.find((f) => f === params.get('form')) ?? 'weighing'
  const pick = (next: RecordFormName) =>
    setParams(
      (current) => {
        const p = new URLSearchParams(current)
        p.set('form', next)
        return p
      },
      { replace: true },
    )
  const canRecord = me.role !== 'observer'

  return (
    <section className="mx-auto flex w-full max-w-4xl flex-col gap-4">
      <PageHeader title={`Batch ${batch.code}`} />
      <BatchSummary batch={batch} tanks={tanks} />
      <BatchStock batchId={id} me={me} timeZone={facility.timeZone} />
      {eventId !== null && (
        <p className="flex items-center gap-2 text-sm text-tide-800">
          <CalendarRange aria-hidden className="size-4" /> Records added here belong to
          <Link to={`/events/${eventId}`} className="font-semibold underline">
            the event
          </Link>
        </p>
      )}
      {canRecord && (
        <section aria-label="Add to the record" className="flex flex-col gap-3">
          <h2 className="text-xl font-bold text-tide-900">Add to the record</h2>
          <RecordFormPicker value={form} onChange={pick} />
          {form === 'box' && <TransportBoxForm batchId={id} eventId={eventId} tempLimitC={facility.arrivalTempDiffLimitC} />}
          {form === 'water' && <TransportWaterForm batchId={id} eventId={eventId} />}
          {form === 'weighing' && <WeighingForm batchId={id} eventId={eventId} />}
          {form === 'bath' && <BathRecordForm batchId={id} eventId={eventId} />}
          {form === 'note' && <NoteForm batchId={id} eventId={eventId} canReview={me.role === 'manager'} />}
        </section>
      )}
      <section aria-labelledby="record-heading" className="flex flex-col gap-3">
        <h2 id="record-heading" className="text-xl font-bold text-tide-900">
          Record
        </h2>
        <RecordList records={records} zone={facility.timeZone} />
      </section>
    </section>
  )
}
