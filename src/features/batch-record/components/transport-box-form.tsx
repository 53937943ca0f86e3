import { compareWater } from '#shared/arrival/compare-water'
import { Field } from '../../../components/ui/field'
import { useRecordForm } from '../hooks/use-record-form'
import { parseDecimal } from '../utils/numbers'
import { transportBoxForm, type TransportBoxValues } from '../utils/record-schemas'
import { FormCard } from './form-card'
import { WaterComparison } from './water-comparison'

const empty: TransportBoxValues = { box: 'Box 1', doMgL: '', tempC: '', pH: '', receivingTempC: '', receivingPH: '' }

/** "Box 3" after "Box 2": the next box in the consignment, the receiving water unchanged. */
const nextBox = (v: TransportBoxValues): TransportBoxValues => {
  const m = /^(.*?)(\d+)$/.exec(v.box.trim())
  return { ...empty, box: m ? `${m[1]}${Number(m[2]) + 1}` : '', receivingTempC: v.receivingTempC, receivingPH: v.receivingPH }
}

export function TransportBoxForm({ batchId, eventId, tempLimitC }: { batchId: number; eventId: number | null; tempLimitC: number }) {
  const { form, submit, saving } = useRecordForm(transportBoxForm, {
    batchId,
    eventId,
    defaultValues: empty,
    next: nextBox,
    saved: (r) => {
      const warnings = Array.isArray(r.data.warnings) ? r.data.warnings.length : 0
      return `Saved the check of ${String(r.data.box)}${warnings ? ` with ${warnings} ${warnings === 1 ? 'warning' : 'warnings'}` : ''}.`
    },
  })
  const {
    register,
    watch,
    formState: { errors },
  } = form
  const v = watch()
  const [tempC, pH, doMgL, receivingTempC, receivingPH] = [v.tempC, v.pH, v.doMgL, v.receivingTempC, v.receivingPH].map(parseDecimal)
  const comparison =
    tempC !== null && pH !== null && receivingTempC !== null && receivingPH !== null
      ? compareWater({ tempC, pH, doMgL: doMgL ?? undefined }, { tempC: receivingTempC, pH: receivingPH }, tempLimitC)
      : null
  const num = { inputMode: 'decimal' as const, autoComplete: 'off' }

  return (
    <FormCard
      title="Transport box check"
      description="Each box beside the receiving water, before any fish go in."
      onSubmit={submit}
      saving={saving}
      saveLabel="Save box check"
    >
      <Field label="Box" error={errors.box?.message} {...register('box')} />
      <fieldset className="grid grid-cols-2 items-end gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-bold text-tide-900">Box water</legend>
        <Field label="Temperature (°C)" {...num} error={errors.tempC?.message} {...register('tempC')} />
        <Field label="pH" {...num} error={errors.pH?.message} {...register('pH')} />
        <Field label="DO (mg/L)" {...num} error={errors.doMgL?.message} {...register('doMgL')} />
      </fieldset>
      <fieldset className="grid grid-cols-2 items-end gap-3 sm:grid-cols-3">
        <legend className="mb-1 text-sm font-bold text-tide-900">Receiving water</legend>
        <Field label="Receiving temperature (°C)" {...num} error={errors.receivingTempC?.message} {...register('receivingTempC')} />
        <Field label="Receiving pH" {...num} error={errors.receivingPH?.message} {...register('receivingPH')} />
      </fieldset>
      <WaterComparison comparison={comparison} tempLimitC={tempLimitC} />
    </FormCard>
  )
}
