import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { clsx } from 'clsx'
import { Info, RefreshCw } from 'lucide-react'
import { useSearchParams } from 'react-router-dom'
import { facilityQueries } from '../../api/facility'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { outboxQueries } from '../../features/outbox/api/outbox-queries'
import { OutboxList } from '../../features/outbox/components/outbox-list'
import { OutboxMessageView } from '../../features/outbox/components/outbox-message-view'
import { PushOutboxSection } from '../../features/outbox/components/push-outbox-section'
import { TextOutboxList } from '../../features/outbox/components/text-outbox-list'

export const loader = (queryClient: QueryClient) => () =>
  Promise.all([
    queryClient.ensureQueryData(outboxQueries.list()),
    queryClient.ensureQueryData(outboxQueries.texts()),
    queryClient.ensureQueryData(facilityQueries.timeZone()),
  ])

export function Component() {
  const { data: messages, refetch, isFetching } = useSuspenseQuery(outboxQueries.list())
  const { data: texts } = useSuspenseQuery(outboxQueries.texts())
  const { data: timeZone } = useSuspenseQuery(facilityQueries.timeZone())
  const [params] = useSearchParams()
  const selectedId = Number(params.get('id')) || null
  const selected = messages?.find((m) => m.id === selectedId) ?? null

  return (
    <section className="flex flex-col gap-4">
      <PageHeader title="Outbox">
        {messages && (
          <Button type="button" variant="secondary" onClick={() => void refetch()} disabled={isFetching}>
            <RefreshCw aria-hidden className={clsx('size-5', isFetching && 'animate-spin')} /> {isFetching ? 'Refreshing…' : 'Refresh'}
          </Button>
        )}
      </PageHeader>
      {texts && (
        <section aria-labelledby="texts-heading" className="flex flex-col gap-2">
          <h2 id="texts-heading" className="text-lg font-bold text-tide-900">
            Text messages
          </h2>
          <p className="text-sm text-tide-700">
            Local text mode: texts go to a stand-in provider on this machine. Reply as the recipient to try acknowledging by text.
          </p>
          <TextOutboxList texts={texts} timeZone={timeZone} />
        </section>
      )}
      <PushOutboxSection timeZone={timeZone} />
      {messages === null ? (
        <p className="flex max-w-xl items-start gap-2 rounded-xl border border-tide-200 bg-white p-4 text-tide-700">
          <Info aria-hidden className="mt-0.5 size-5 shrink-0" /> This server sends real e-mail through its mail host, so there is no outbox to show. The outbox
          exists only in local mail mode.
        </p>
      ) : (
        <>
          <p className="text-sm text-tide-700">
            Local mail mode: the e-mail Roundtide sent is kept here instead of leaving this machine. Checked every 10 seconds.
          </p>
          <div className="grid gap-4 md:grid-cols-[minmax(0,2fr)_minmax(0,3fr)] md:items-start">
            <div className={clsx(selected && 'hidden md:block')}>
              <OutboxList messages={messages} selectedId={selected?.id ?? null} timeZone={timeZone} />
            </div>
            {selected ? (
              <OutboxMessageView key={selected.id} message={selected} timeZone={timeZone} />
            ) : (
              messages.length > 0 && (
                <p className="hidden rounded-xl border border-dashed border-tide-300 p-6 text-center text-tide-600 md:block">Choose a message to read it.</p>
              )
            )}
          </div>
        </>
      )}
    </section>
  )
}
