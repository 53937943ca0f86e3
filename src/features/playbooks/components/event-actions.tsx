import { Ban, Flag } from 'lucide-react'
import { useState } from 'react'
import { toast } from 'sonner'
import type { FacilityEvent } from '#shared/schemas/playbook'
import { Button } from '../../../components/ui/button'
import { useFinishEvent } from '../api/use-event-mutations'

const CONFIRM = {
  end: { ask: 'End this event? Its tasks stay as records; held feeds still ahead go back on the board.', yes: 'Yes, end event', done: 'Event ended.' },
  cancel: {
    ask: 'Cancel this event? Its untouched tasks are removed; held feeds still ahead go back on the board.',
    yes: 'Yes, cancel event',
    done: 'Event cancelled.',
  },
} as const

/** End or cancel, each behind a second, explicit step. */
export function EventActions({ event }: { event: FacilityEvent }) {
  const finish = useFinishEvent()
  const [asking, setAsking] = useState<'end' | 'cancel' | null>(null)
  if (event.status !== 'planned') return null
  if (asking) {
    const c = CONFIRM[asking]
    return (
      <div role="group" aria-label={`Confirm: ${asking} ${event.title}`} className="flex flex-col gap-2 rounded-lg border border-ember-100 bg-ember-50 p-3">
        <p className="text-sm text-tide-900">{c.ask}</p>
        <div className="flex flex-wrap gap-2">
          <Button
            variant={asking === 'cancel' ? 'danger' : 'primary'}
            disabled={finish.isPending}
            onClick={() =>
              finish.mutate(
                { id: event.id, action: asking },
                {
                  onSuccess: () => {
                    toast.success(c.done)
                    setAsking(null)
                  },
                },
              )
            }
          >
            {c.yes}
          </Button>
          <Button variant="ghost" onClick={() => setAsking(null)}>
            Keep it
          </Button>
        </div>
      </div>
    )
  }
  return (
    <div className="flex flex-wrap gap-2">
      <Button variant="secondary" onClick={() => setAsking('end')} aria-label={`End ${event.title}`}>
        <Flag aria-hidden className="size-4" /> End
      </Button>
      <Button variant="secondary" onClick={() => setAsking('cancel')} aria-label={`Cancel ${event.title}`}>
        <Ban aria-hidden className="size-4" /> Cancel
      </Button>
    </div>
  )
}
