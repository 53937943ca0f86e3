import { Plus } from 'lucide-react'
import { useState, type FormEvent } from 'react'
import { toast } from 'sonner'
import { CylinderInputSchema } from '#shared/schemas/oxygen'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import { useAddCylinder } from '../api/use-oxygen-mutations'
import { parseDecimal } from '../utils/format'
import { SelectField } from '../../../components/ui/select-field'

const blank = { code: '', label: '', method: 'metric' as 'metric' | 'psi-factor', size: '', reserve: '20', flow: '' }

/** A cylinder or bank to watch; its size is either water capacity (bar gauges) or a factor (psi gauges). */
export function AddCylinderForm({ onDone }: { onDone: () => void }) {
  const add = useAddCylinder()
  const [v, setV] = useState(blank)
  const [errors, setErrors] = useState<Record<string, string | undefined>>({})
  const set = (key: keyof typeof blank) => (value: string) => setV((old) => ({ ...old, [key]: value }))
  const metric = v.method === 'metric'

  const submit = (e: FormEvent) => {
    e.preventDefault()
    const size = parseDecimal(v.size)
    const parsed = CylinderInputSchema.safeParse({
      code: v.code,
      label: v.label,
      method: v.method,
      waterCapacityL: metric ? size : null,
      factorLPerPsi: metric ? null : size,
      reservePressure: parseDecimal(v.reserve) ?? Number.NaN,
      flowLPerMin: parseDecimal(v.flow) ?? 0,
    })
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])))
      return
    }
    setErrors({})
    add.mutate(parsed.data, {
      onSuccess: (c) => {
        toast.success(`Added ${c.code}. Record a gauge reading to see its hours.`)
        onDone()
      },
      onError: (error) => {
        if (error instanceof ApiError && error.fieldErrors) setErrors(Object.fromEntries(Object.entries(error.fieldErrors).map(([k, m]) => [k, m[0]])))
      },
    })
  }

  return (
    <form noValidate onSubmit={submit} aria-label="Add cylinder" className="flex flex-col gap-3 rounded-xl border border-tide-300 bg-white p-4">
      <h2 className="text-lg font-bold text-tide-900">Add a cylinder or bank</h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Code" value={v.code} onChange={(e) => set('code')(e.target.value)} error={errors.code} />
        <Field label="Label" value={v.label} onChange={(e) => set('label')(e.target.value)} error={errors.label} />
        <SelectField
          label="Gauge reads"
          value={v.method}
          onChange={(e) => setV((old) => ({ ...old, method: e.target.value as typeof blank.method, reserve: e.target.value === 'metric' ? '20' : '200' }))}
        >
          <option value="metric">bar (give the water capacity)</option>
          <option value="psi-factor">psi (give the cylinder factor)</option>
        </SelectField>
        <Field
          label={metric ? 'Water capacity (L)' : 'Factor (L per psi)'}
          value={v.size}
          onChange={(e) => set('size')(e.target.value)}
          inputMode="decimal"
          error={errors.waterCapacityL ?? errors.factorLPerPsi}
        />
        <Field
          label={`Reserve pressure (${metric ? 'bar' : 'psi'})`}
          value={v.reserve}
          onChange={(e) => set('reserve')(e.target.value)}
          inputMode="decimal"
          error={errors.reservePressure}
        />
        <Field label="Usual flow (L/min)" value={v.flow} onChange={(e) => set('flow')(e.target.value)} inputMode="decimal" error={errors.flowLPerMin} />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={add.isPending}>
          <Plus aria-hidden className="size-5" /> Add cylinder
        </Button>
        <Button type="button" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  )
}
