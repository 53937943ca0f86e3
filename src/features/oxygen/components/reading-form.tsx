import { Gauge } from 'lucide-react'
import { useState, type FormEvent } from 'react'
import type { CylinderStatus } from '#shared/schemas/oxygen'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import { useRecordCylinderReading } from '../api/use-oxygen-mutations'
import { parseDecimal } from '../utils/format'

/** A gauge reading and the flow in use; the server works out the hours left. */
export function ReadingForm({ cylinder, onSaved }: { cylinder: CylinderStatus; onSaved: (status: CylinderStatus) => void }) {
  const record = useRecordCylinderReading()
  const [pressure, setPressure] = useState('')
  const [flow, setFlow] = useState(cylinder.flowLPerMin > 0 ? String(cylinder.flowLPerMin) : '')
  const [errors, setErrors] = useState<{ pressure?: string; flow?: string }>({})

  const submit = (e: FormEvent) => {
    e.preventDefault()
    const p = parseDecimal(pressure)
    const f = parseDecimal(flow)
    const found = {
      pressure: p === null ? 'Enter the gauge pressure' : p < 0 ? 'Pressure cannot be negative' : undefined,
      flow: f === null || f <= 0 ? 'Enter a flow above 0' : undefined,
    }
    setErrors(found)
    if (found.pressure || found.flow) return
    record.mutate(
      { id: cylinder.id, reading: { pressure: p!, flowLPerMin: f! } },
      {
        onSuccess: (status) => {
          setPressure('')
          onSaved(status)
        },
        onError: (error) => {
          if (error instanceof ApiError && error.fieldErrors) setErrors({ pressure: error.fieldErrors.pressure?.[0], flow: error.fieldErrors.flowLPerMin?.[0] })
        },
      },
    )
  }

  return (
    <form
      noValidate
      onSubmit={submit}
      aria-label={`Reading for ${cylinder.code}`}
      className="grid grid-cols-2 gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-start"
    >
      <Field
        label={`Gauge (${cylinder.unit})`}
        value={pressure}
        onChange={(e) => setPressure(e.target.value)}
        inputMode="decimal"
        autoComplete="off"
        error={errors.pressure}
      />
      <Field label="Flow (L/min)" value={flow} onChange={(e) => setFlow(e.target.value)} inputMode="decimal" autoComplete="off" error={errors.flow} />
      <Button type="submit" disabled={record.isPending} className="col-span-2 sm:col-span-1 sm:mt-6">
        <Gauge aria-hidden className="size-5" /> {record.isPending ? 'Saving…' : 'Save reading'}
      </Button>
    </form>
  )
}
