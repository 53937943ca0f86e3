import { BellRing, CircleCheck } from 'lucide-react'
import { Link } from 'react-router-dom'
import { toast } from 'sonner'
import { Button } from '../../../components/ui/button'
import type { WaitingAlert } from '../api/on-call-queries'
import { useAcknowledgeAlert } from '../api/use-acknowledge-alert'
import { formatWhen } from '../../../lib/zone-format'
import { OnCallSection } from './on-call-section'

const KIND_TEXT: Record<string, string> = { missed_task: 'Missed task', critical_reading: 'Critical reading' }

/** Escalations nobody has acknowledged yet; acknowledging one stops its ladder. */
export function WaitingEscalations({ alerts, timeZone, canAcknowledge }: { alerts: WaitingAlert[]; timeZone: string; canAcknowledge: boolean }) {
  const acknowledge = useAcknowledgeAlert()
  return (
    <OnCallSection title="Escalations waiting for an answer" icon={BellRing} count={alerts.length}>
      {alerts.length === 0 ? (
        <p className="flex items-center gap-2 text-kelp-700">
          <CircleCheck aria-hidden className="size-5" /> Nothing is waiting for an answer.
        </p>
      ) : (
        <ul className="flex flex-col gap-3">
          {alerts.map((a) => (
            <li key={a.id} className="rounded-lg border border-alarm-100 bg-alarm-50 p-3">
              <p className="flex items-center gap-2 font-bold text-alarm-700">
                <BellRing aria-hidden className="size-5 shrink-0" /> {KIND_TEXT[a.kind] ?? a.kind}
                {a.task && `: ${a.task.title}`}
              </p>
              <p className="mt-1 text-sm text-tide-800">
                {a.detail}
                {a.task && ` · ${a.task.targetLabel}`} · since {formatWhen(a.startedAt, timeZone)}
              </p>
              <div className="mt-2 flex flex-wrap items-center gap-3">
                {canAcknowledge && (
                  <Button
                    type="button"
                    disabled={acknowledge.isPending}
                    aria-label={`Acknowledge ${a.task?.title ?? 'this escalation'}`}
                    onClick={() => acknowledge.mutate(a.id, { onSuccess: () => toast.success('Acknowledged; the ladder has stopped.') })}
                  >
                    Acknowledge
                  </Button>
                )}
                {a.task && (
                  <Link to={`/tasks/${a.task.id}`} className="inline-flex min-h-11 items-center font-semibold text-tide-700 underline">
                    Open the task
                  </Link>
                )}
              </div>
            </li>
          ))}
        </ul>
      )}
      {!canAcknowledge && alerts.length > 0 && <p className="mt-2 text-sm text-tide-600">Observers acknowledge through the link in their e-mail.</p>}
    </OnCallSection>
  )
}
