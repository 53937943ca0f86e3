import { Save, Scale } from 'lucide-react'
import { useRef, useState } from 'react'
import { toast } from 'sonner'
import { Button } from '../../../components/ui/button'
import { useAddRecord } from '../api/use-add-record'
import { useWeighingDraft } from '../hooks/use-weighing-draft'
import { MAX_FISH } from '../utils/weights'
import { WeighingStats } from './weighing-stats'
import { WeightEntryField } from './weight-entry'
import { WeightList } from './weight-list'

/** Sample weighing: 20–30 fish typed one after another, the statistics live, then one save. */
export function WeighingForm({ batchId, eventId }: { batchId: number; eventId: number | null }) {
  const add = useAddRecord(batchId)
  const [entries, setEntries] = useWeighingDraft(batchId)
  const nextId = useRef(Math.max(0, ...entries.map((e) => e.id)) + 1)
  const [allowedErrorPct, setAllowedErrorPct] = useState(10)
  const [updateBatchMean, setUpdateBatchMean] = useState(true)

  const save = () =>
    add.mutate(
      { kind: 'weighing', weightsG: entries.map((e) => e.grams), updateBatchMean, eventId },
      {
        onSuccess: (record) => {
          const mean = typeof record.data.mean === 'number' ? ` mean ${record.data.mean.toFixed(2)} g` : ''
          toast.success(`Saved the weighing of ${entries.length} fish,${mean}.${updateBatchMean ? ' The batch mean weight is updated.' : ''}`)
          setEntries([])
        },
      },
    )

  return (
    <section aria-labelledby="weighing-heading" className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <div>
        <h3 id="weighing-heading" className="flex items-center gap-2 text-lg font-bold text-tide-900">
          <Scale aria-hidden className="size-5 text-tide-600" /> Sample weighing
        </h3>
        <p className="text-sm text-tide-600">Weigh 20–30 fish picked at random; the mean can set the batch’s weight and rations.</p>
      </div>
      <WeightEntryField
        count={entries.length}
        disabled={entries.length >= MAX_FISH}
        onAdd={(grams, decimals) => setEntries((list) => [...list, { id: nextId.current++, grams, decimals }])}
      />
      <WeighingStats entries={entries} allowedErrorPct={allowedErrorPct} onAllowedErrorChange={setAllowedErrorPct} />
      <WeightList entries={entries} onDelete={(id) => setEntries((list) => list.filter((e) => e.id !== id))} />
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" className="size-5" checked={updateBatchMean} onChange={(e) => setUpdateBatchMean(e.target.checked)} />
        <span className="text-tide-900">Set the batch’s mean weight from this sample (rations follow it)</span>
      </label>
      <Button type="button" onClick={save} disabled={entries.length < 2 || add.isPending} className="w-full sm:w-auto sm:self-start">
        <Save aria-hidden className="size-5" /> {add.isPending ? 'Saving…' : `Save weighing (${entries.length} fish)`}
      </Button>
      {entries.length === 1 && <p className="text-sm text-tide-600">Weigh at least two fish to save.</p>}
    </section>
  )
}
