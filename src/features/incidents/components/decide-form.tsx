import { Ban, CircleCheck } from 'lucide-react'
import { useState } from 'react'
import { DecideIncidentInputSchema } from '#shared/schemas/incident'
import { Button } from '../../../components/ui/button'
import { TextAreaField } from '../../../components/ui/text-area-field'
import { ApiError } from '../../../lib/api-client'
import { useDecideIncident } from '../api/use-incident-mutations'

/** Roundtide only proposes: a supervisor or manager confirms it (it becomes open) or dismisses it, always saying why. */
export function DecideForm({ incidentId }: { incidentId: number }) {
  const decide = useDecideIncident(incidentId)
  const [reason, setReason] = useState('')
  const [error, setError] = useState<string | undefined>()
  const send = (decision: 'confirm' | 'dismiss') => {
    const parsed = DecideIncidentInputSchema.safeParse({ reason })
    if (!parsed.success) return setError(parsed.error.issues[0].message)
    setError(undefined)
    decide.mutate(
      { decision, reason: parsed.data.reason },
      {
        onError: (e) => setError(e instanceof ApiError ? (e.fieldErrors?.reason?.[0] ?? e.message) : e.message),
      },
    )
  }
  return (
    <form
      noValidate
      aria-label="Decide on this proposal"
      onSubmit={(e) => {
        e.preventDefault()
        send('confirm')
      }}
      className="flex flex-col gap-3 rounded-xl border-2 border-ember-500 bg-white p-4"
    >
      <h2 className="text-lg font-bold text-tide-900">Confirm or dismiss</h2>
      <p className="text-sm text-tide-700">Nothing is reported until a person confirms it. Say why either way: the reason stays on the record.</p>
      <TextAreaField
        label="Reason"
        value={reason}
        error={error}
        onChange={(e) => {
          setReason(e.target.value)
          setError(undefined)
        }}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={decide.isPending}>
          <CircleCheck aria-hidden className="size-5" /> Confirm incident
        </Button>
        <Button type="button" variant="secondary" disabled={decide.isPending} onClick={() => send('dismiss')}>
          <Ban aria-hidden className="size-5" /> Dismiss
        </Button>
      </div>
    </form>
  )
}
