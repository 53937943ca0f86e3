import { Link } from 'react-router-dom'
import { bathDose } from '#shared/dosing/bath-dose'
import { Field } from '../../../components/ui/field'
import { useRecordForm } from '../hooks/use-record-form'
import { parseDecimal } from '../utils/numbers'
import { bathForm, type BathValues } from '../utils/record-schemas'
import { BathCautions } from '../../../components/ui/bath-cautions'
import { FormCard } from './form-card'
import { Notice } from './notice'
import { TextAreaField } from '../../../components/ui/text-area-field'

const empty: BathValues = { product: '', targetMgL: '', volumeL: '', purityPct: '100', gramsWeighed: '', minutes: '', observations: '' }

// Beyond this, what was weighed and what the figures give are worth a second look.
const TOLERANCE = 0.05

function expectedGrams(v: BathValues) {
  const [target, volume, purity] = [v.targetMgL, v.volumeL, v.purityPct].map(parseDecimal)
  if (target === null || volume === null || purity === null) return null
  try {
    return bathDose({ targetMgPerL: target, bathVolumeL: volume, purityPercent: purity }).productG
  } catch {
    return null
  }
}

/** A bath as given: what, how strong, how long, what was weighed, and how the fish took it. */
export function BathRecordForm({ batchId, eventId }: { batchId: number; eventId: number | null }) {
  const { form, submit, saving } = useRecordForm(bathForm, {
    batchId,
    eventId,
    defaultValues: empty,
    saved: (r) => `Saved the ${String(r.data.product)} bath.`,
  })
  const {
    register,
    watch,
    formState: { errors },
  } = form
  const v = watch()
  const expected = expectedGrams(v)
  const weighed = parseDecimal(v.gramsWeighed)
  const off = expected !== null && weighed !== null && Math.abs(weighed - expected) / expected > TOLERANCE
  const num = { inputMode: 'decimal' as const, autoComplete: 'off' }
  return (
    <FormCard
      title="Bath record"
      description="Record a bath given on the veterinarian’s instruction."
      onSubmit={submit}
      saving={saving}
      saveLabel="Save bath record"
    >
      <Field label="Product" error={errors.product?.message} {...register('product')} />
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        <Field label="Target (mg/L)" {...num} error={errors.targetMgL?.message} {...register('targetMgL')} />
        <Field label="Bath volume (L)" {...num} error={errors.volumeL?.message} {...register('volumeL')} />
        <Field label="Purity (%)" {...num} error={errors.purityPct?.message} {...register('purityPct')} />
        <Field label="Weighed (g)" {...num} error={errors.gramsWeighed?.message} {...register('gramsWeighed')} />
        <Field label="Duration (min)" inputMode="numeric" error={errors.minutes?.message} {...register('minutes')} />
      </div>
      {expected !== null && (
        <Notice tone={off ? 'watch' : 'info'}>
          Amount for the figures you entered: {expected.toFixed(2)} g of product.
          {off && ' What was weighed differs by more than 5 %; check the scale and the figures.'}
        </Notice>
      )}
      <TextAreaField label="Observations" rows={3} {...register('observations')} />
      <BathCautions permanganate={/permanganate|kmno4/i.test(v.product)} />
      <Link to="/calculators" className="text-sm font-semibold text-tide-700 underline">
        Open the bath calculator
      </Link>
    </FormCard>
  )
}
