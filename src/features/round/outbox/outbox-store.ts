import { createStore, del, set, values, type UseStore } from 'idb-keyval'
import type { CompletionPayload } from '../api/completion-api'

export interface OutboxFailure {
  status: number
  message: string
  fieldErrors?: Record<string, string[]>
  /** From a 409: who finished the task first, and when. */
  completedByName?: string
  completedAt?: string
}

/** A completion made while the server could not be reached, kept on the phone until it is sent. */
export interface OutboxEntry {
  completionId: string
  taskId: number
  personId: number
  taskTitle: string
  targetLabel: string
  input: CompletionPayload
  queuedAt: number
  /** Set when the server refused it; the entry stays until the person dismisses it. */
  failure: OutboxFailure | null
}

let entries: OutboxEntry[] = []
let loading: Promise<void> | null = null
let idb: UseStore | null = null
const listeners = new Set<() => void>()

function store(): UseStore {
  idb ??= createStore('roundtide-outbox', 'completions')
  return idb
}

function publish(next: OutboxEntry[]) {
  entries = [...next].sort((a, b) => a.queuedAt - b.queuedAt)
  listeners.forEach((listener) => listener())
}

// Without IndexedDB (some private modes) the queue still works for this page's lifetime.
const persist = (work: () => Promise<void>) => work().catch(() => undefined)

export function subscribeOutbox(listener: () => void) {
  listeners.add(listener)
  return () => listeners.delete(listener)
}

export const outboxEntries = () => entries

export function loadOutbox(): Promise<void> {
  loading ??= values<OutboxEntry>(store())
    .then((saved) => {
      const known = new Set(entries.map((e) => e.completionId))
      publish([...entries, ...saved.filter((e) => !known.has(e.completionId))])
    })
    .catch(() => undefined)
  return loading
}

export async function addToOutbox(entry: OutboxEntry) {
  publish([...entries, entry])
  await persist(() => set(entry.completionId, entry, store()))
}

export async function markFailed(completionId: string, failure: OutboxFailure | null) {
  const entry = entries.find((e) => e.completionId === completionId)
  if (!entry) return
  const next = { ...entry, failure }
  publish(entries.map((e) => (e === entry ? next : e)))
  await persist(() => set(completionId, next, store()))
}

export async function removeFromOutbox(completionId: string) {
  publish(entries.filter((e) => e.completionId !== completionId))
  await persist(() => del(completionId, store()))
}
