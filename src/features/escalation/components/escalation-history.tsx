import { ShieldCheck } from 'lucide-react'
import type { EscalationRecord } from '#shared/schemas/ladder'
import { AlertRecord } from './alert-record'

export function EscalationHistory({
  alerts,
  taskId,
  timeZone,
  canAcknowledge,
}: {
  alerts: EscalationRecord[]
  taskId: number
  timeZone: string
  canAcknowledge: boolean
}) {
  return (
    <section aria-labelledby="escalation-heading" className="flex flex-col gap-3">
      <h2 id="escalation-heading" className="text-xl font-bold text-tide-900">
        Escalation
      </h2>
      {alerts.length === 0 ? (
        <p className="flex items-center gap-2 rounded-xl border border-tide-200 bg-white p-4 text-tide-700">
          <ShieldCheck aria-hidden className="size-5 text-kelp-600" /> This task has not escalated.
        </p>
      ) : (
        [...alerts].reverse().map((a) => <AlertRecord key={a.alertId} alert={a} taskId={taskId} timeZone={timeZone} canAcknowledge={canAcknowledge} />)
      )}
      {!canAcknowledge && alerts.some((a) => !a.acknowledgedAt && !a.closedAt) && (
        <p className="text-sm text-tide-600">Observers acknowledge through the link in their e-mail.</p>
      )}
    </section>
  )
}
