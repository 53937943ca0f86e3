import { Field } from '../../../components/ui/field'
import { useRecordForm } from '../hooks/use-record-form'
import { parseDecimal } from '../utils/numbers'
import { transportWaterForm, type TransportWaterValues } from '../utils/record-schemas'
import { AmmoniaResult } from './ammonia-result'
import { FormCard } from './form-card'

const empty: TransportWaterValues = { alkalinityMgL: '', pH: '', tanMgL: '', nitriteMgL: '', tempC: '', salinity: '0' }

export function TransportWaterForm({ batchId, eventId }: { batchId: number; eventId: number | null }) {
  const { form, submit, saving } = useRecordForm(transportWaterForm, {
    batchId,
    eventId,
    defaultValues: empty,
    saved: (r) => `Saved the transport-water test${typeof r.data.nh3MgL === 'number' ? ` (NH3-N ${r.data.nh3MgL} mg/L)` : ''}.`,
  })
  const {
    register,
    watch,
    formState: { errors },
  } = form
  const v = watch()
  const num = { inputMode: 'decimal' as const, autoComplete: 'off' }
  return (
    <FormCard
      title="Transport-water test"
      description="Test the bag or box water before it mixes with the system."
      onSubmit={submit}
      saving={saving}
      saveLabel="Save water test"
    >
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
        <Field label="Temperature (°C)" {...num} error={errors.tempC?.message} {...register('tempC')} />
        <Field label="pH" {...num} error={errors.pH?.message} {...register('pH')} />
        <Field label="Salinity (g/kg)" {...num} error={errors.salinity?.message} hint="0 for fresh water" {...register('salinity')} />
        <Field label="TAN (mg/L N)" {...num} error={errors.tanMgL?.message} {...register('tanMgL')} />
        <Field label="Nitrite-N (mg/L)" {...num} error={errors.nitriteMgL?.message} {...register('nitriteMgL')} />
        <Field label="Alkalinity (mg/L CaCO3)" {...num} error={errors.alkalinityMgL?.message} {...register('alkalinityMgL')} />
      </div>
      <AmmoniaResult tanMgL={parseDecimal(v.tanMgL)} pH={parseDecimal(v.pH)} tempC={parseDecimal(v.tempC)} salinity={parseDecimal(v.salinity)} />
      <p className="text-sm text-tide-600">
        Opening a bag lets CO2 escape and the pH rise, which turns more ammonia toxic: match pH before mixing and do not aerate the bag water hard.
      </p>
    </FormCard>
  )
}
