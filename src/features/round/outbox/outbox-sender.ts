import type { QueryClient } from '@tanstack/react-query'
import { ApiError } from '../../../lib/api-client'
import { isTransient, postCompletion } from '../api/completion-api'
import { applyCompletionResult } from '../api/round-cache'
import { rememberResult } from '../state/result-store'
import { loadOutbox, markFailed, outboxEntries, removeFromOutbox, type OutboxEntry, type OutboxFailure } from './outbox-store'

let client: QueryClient | null = null
let personId: number | null = null
let listening = false
let running = false
let again = false
let attempt = 0
let timer: ReturnType<typeof setTimeout> | undefined

/** Starts sending the queue for this person: now, whenever the phone comes back online, and on a back-off. */
export function startOutbox(queryClient: QueryClient, person: number) {
  client = queryClient
  personId = person
  if (!listening) {
    listening = true
    window.addEventListener('online', () => {
      attempt = 0
      void flushOutbox()
    })
  }
  void loadOutbox().then(flushOutbox)
}

export const waitingEntries = (person: number | null) => outboxEntries().filter((e) => e.personId === person && !e.failure)

function failureFrom(error: unknown): OutboxFailure {
  if (!(error instanceof ApiError)) return { status: 0, message: (error as Error).message }
  const d = error.details
  return {
    status: error.status,
    message: error.message,
    fieldErrors: error.fieldErrors,
    completedByName: typeof d?.completedByName === 'string' ? d.completedByName : undefined,
    completedAt: typeof d?.completedAt === 'string' ? d.completedAt : undefined,
  }
}

async function send(entry: OutboxEntry): Promise<'sent' | 'failed' | 'retry'> {
  try {
    // The same completion id as the first try: if an earlier send got through, the server answers with that result.
    const result = await postCompletion(entry.taskId, entry.input)
    rememberResult(entry.taskId, result)
    if (client) await applyCompletionResult(client, result, entry.personId)
    await removeFromOutbox(entry.completionId)
    return 'sent'
  } catch (error) {
    if (isTransient(error)) return 'retry'
    await markFailed(entry.completionId, failureFrom(error))
    return 'failed'
  }
}

function retryLater() {
  const delay = Math.min(60_000, 2_000 * 2 ** attempt) * (0.8 + Math.random() * 0.4)
  attempt += 1
  clearTimeout(timer)
  timer = setTimeout(() => void flushOutbox(), delay)
}

/** Sends waiting completions in the order they were made; stops at the first one the network refuses. */
export async function flushOutbox(): Promise<void> {
  if (personId === null) return
  if (running) {
    again = true
    return
  }
  running = true
  clearTimeout(timer)
  try {
    for (const entry of waitingEntries(personId)) {
      if ((await send(entry)) === 'retry') return retryLater()
    }
    attempt = 0
  } finally {
    running = false
    if (again) {
      again = false
      void flushOutbox()
    }
  }
}

/** Clears a refusal so the entry is tried again (e.g. after a server error). */
export async function retryEntry(completionId: string) {
  await markFailed(completionId, null)
  attempt = 0
  await flushOutbox()
}
