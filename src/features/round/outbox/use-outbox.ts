import { useMemo, useSyncExternalStore } from 'react'
import { outboxEntries, subscribeOutbox } from './outbox-store'

/** This person's queued completions, by task id, kept in step with IndexedDB. */
export function useOutbox(personId: number) {
  const all = useSyncExternalStore(subscribeOutbox, outboxEntries)
  return useMemo(() => {
    const mine = all.filter((e) => e.personId === personId)
    return {
      entries: mine,
      byTask: new Map(mine.map((e) => [e.taskId, e])),
      waiting: mine.filter((e) => !e.failure).length,
      failed: mine.filter((e) => e.failure).length,
    }
  }, [all, personId])
}
