import { useQuery, useQueryClient } from '@tanstack/react-query'
import { useEffect, useState, type ReactNode } from 'react'
import { Button } from '../../../components/ui/button'
import { ErrorState, LoadingState } from '../../../components/ui/page-state'
import { roundQueries } from '../api/round-queries'
import type { SubmitOutcome } from '../api/use-submit-completion'
import { useOnline } from '../../../lib/use-online'
import { startOutbox } from '../outbox/outbox-sender'
import { useOutbox } from '../outbox/use-outbox'
import { DraftsProvider } from '../state/drafts'
import { isFinished } from '../utils/group-round'
import { nextOpenTask } from '../utils/next-task'
import { OutboxOrphans } from './outbox-orphans'
import { RoundEmpty } from './round-empty'
import { RoundHeader } from './round-header'
import { RoundList } from './round-list'

// One readable column on wide screens; the phone uses the full width.
const column = 'mx-auto max-w-2xl'

interface Props {
  personId: number
  date: string | null
  /** The live-connection indicator, composed in by the route. */
  status?: ReactNode
}

export function RoundView(props: Props) {
  return (
    <DraftsProvider>
      <RoundContent {...props} />
    </DraftsProvider>
  )
}

function RoundContent({ personId, date, status }: Props) {
  const queryClient = useQueryClient()
  const query = useQuery(roundQueries.day(date))
  const outbox = useOutbox(personId)
  const online = useOnline()
  const [expandedId, setExpandedId] = useState<number | null>(null)
  const [advancedTo, setAdvancedTo] = useState<number | null>(null)

  useEffect(() => startOutbox(queryClient, personId), [queryClient, personId])

  const round = query.data
  // Open the first task due now when a day's round first arrives, so the walk starts with typing
  // (React's "adjust state while rendering" pattern: runs once per day shown).
  const [autoOpenedFor, setAutoOpenedFor] = useState<string | null>(null)
  if (round && autoOpenedFor !== round.date) {
    setAutoOpenedFor(round.date)
    const first = round.tasks.find(
      (t) => (t.status === 'open' || t.status === 'overdue') && t.assigneeId === personId && !t.recheckOfTaskId && !outbox.byTask.has(t.id),
    )
    if (first) {
      setExpandedId(first.id)
      setAdvancedTo(first.id)
    }
  }
  const header = (done = 0, total = 0) => (
    <RoundHeader
      date={round?.date ?? date}
      done={done}
      total={total}
      waiting={outbox.waiting}
      failed={outbox.failed}
      status={status}
      reserve={!round && !query.isError}
    />
  )

  if (!round) {
    if (query.isError) {
      return (
        <>
          {header()}
          <div className={column}>
            <ErrorState
              title="Could not load your round"
              message={query.error.message}
              action={
                <Button variant="secondary" onClick={() => void query.refetch()}>
                  Try again
                </Button>
              }
            />
          </div>
        </>
      )
    }
    const paused = query.fetchStatus === 'paused' || !online
    return (
      <>
        {header()}
        <div className={column}>
          {paused ? (
            <ErrorState
              title="You are offline"
              message="This round has not been opened on this phone yet, so there is no copy here. It will load as soon as the connection is back."
            />
          ) : (
            <LoadingState label="Loading your round…" />
          )}
        </div>
      </>
    )
  }

  const counted = round.tasks.filter((t) => t.status !== 'held')
  const onFinished = (taskId: number, outcome: SubmitOutcome) => {
    // A flag stays open so the person sees the band and the recheck before walking on.
    if (outcome.kind === 'sent' && outcome.result.task.flag) return
    const next = nextOpenTask(round.tasks, taskId, new Set([...outbox.byTask.keys(), taskId]))
    setExpandedId(next?.id ?? null)
    setAdvancedTo(next?.id ?? null)
  }

  return (
    <>
      {header(counted.filter(isFinished).length, counted.length)}
      <div className={column}>
        <OutboxOrphans entries={outbox.entries} round={round} />
        {round.tasks.length === 0 ? (
          <RoundEmpty />
        ) : (
          <RoundList
            round={round}
            personId={personId}
            online={online}
            expandedId={expandedId}
            advancedTo={advancedTo}
            outboxByTask={outbox.byTask}
            onToggle={(id) => {
              setAdvancedTo(null)
              setExpandedId((current) => (current === id ? null : id))
            }}
            onFinished={onFinished}
          />
        )}
      </div>
    </>
  )
}
