import { useState } from 'react'
import { estimateSupply, PUBLISHED_PSI_FACTORS, PUBLISHED_SAFE_RESIDUAL_PSI, type CylinderSettings } from '#shared/oxygen-supply/cylinder'
import { SelectField } from '../../../components/ui/select-field'
import { attempt, formatHours, parseDecimal } from '../utils/numbers'
import { NumberInput } from './number-input'
import { ResultBox } from './result-box'

type Method = CylinderSettings['method']

/** Time until a cylinder's gauge reaches its reserve pressure at a steady flow. */
export function CylinderCalculator() {
  const [method, setMethod] = useState<Method>('metric')
  const [v, setV] = useState({ capacity: '50', factor: '', pressure: '', reserve: '20', flow: '' })
  const set = (key: keyof typeof v) => (value: string) => setV((old) => ({ ...old, [key]: value }))
  const unit = method === 'metric' ? 'bar' : 'psi'
  const [capacity, factor, pressure, reserve, flow] = [v.capacity, v.factor, v.pressure, v.reserve, v.flow].map(parseDecimal)
  const size = method === 'metric' ? capacity : factor
  const missing = size === null || pressure === null || reserve === null || flow === null
  const result = missing
    ? null
    : attempt(() => {
        const settings: CylinderSettings =
          method === 'metric' ? { method, waterCapacityL: size, reserveBar: reserve } : { method, factorLPerPsi: size, reservePsi: reserve }
        return estimateSupply(settings, { gaugePressure: pressure, flowLPerMin: flow })
      })
  const switchTo = (next: Method) => {
    setMethod(next)
    setV((old) => ({ ...old, reserve: next === 'metric' ? '20' : String(PUBLISHED_SAFE_RESIDUAL_PSI) }))
  }

  return (
    <section aria-labelledby="cylinder-heading" className="flex max-w-2xl flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <h2 id="cylinder-heading" className="text-lg font-bold text-tide-900">
        Oxygen cylinder: time to reserve
      </h2>
      <SelectField label="Cylinder described by" value={method} onChange={(e) => switchTo(e.target.value as Method)}>
        <option value="metric">Water capacity (L) and bar</option>
        <option value="psi-factor">Cylinder factor (L per psi) and psi</option>
      </SelectField>
      <div className="grid grid-cols-2 gap-3">
        {method === 'metric' ? (
          <NumberInput label="Water capacity (L)" value={v.capacity} onChange={set('capacity')} />
        ) : (
          <NumberInput
            label="Factor (L per psi)"
            value={v.factor}
            onChange={set('factor')}
            hint={PUBLISHED_PSI_FACTORS.factors.map((f) => `${f.size} ${f.factorLPerPsi}`).join(' · ')}
          />
        )}
        <NumberInput label={`Gauge pressure (${unit})`} value={v.pressure} onChange={set('pressure')} />
        <NumberInput label={`Reserve pressure (${unit})`} value={v.reserve} onChange={set('reserve')} />
        <NumberInput label="Flow (L/min)" value={v.flow} onChange={set('flow')} />
      </div>
      <ResultBox missing={missing} error={result?.error ?? null}>
        {result?.value && (
          <>
            <p className="text-sm font-semibold text-tide-700">Time to the reserve pressure</p>
            <p className="text-2xl font-bold tabular-nums text-tide-900" data-testid="cylinder-hours">
              {result.value.atOrBelowReserve ? 'At or below reserve now' : formatHours(result.value.hoursToReserve)}
            </p>
            <p className="text-sm text-tide-700">
              {Math.round(result.value.gasLeftL).toLocaleString('en-GB')} L of gas left, {Math.round(result.value.usableL).toLocaleString('en-GB')} L usable
              above the reserve.
            </p>
          </>
        )}
      </ResultBox>
      <p className="text-sm text-tide-600">
        {method === 'metric'
          ? 'Ideal-gas estimate: at full pressure oxygen’s real contents are about 6–8 % more, so this errs on the short side.'
          : `${PUBLISHED_PSI_FACTORS.source} ${PUBLISHED_PSI_FACTORS.caveat}`}
      </p>
    </section>
  )
}
