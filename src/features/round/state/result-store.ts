import { useSyncExternalStore } from 'react'
import type { CompletionResult } from '#shared/schemas/completion'

// The server's answer to a completion made on this phone, kept for the page's lifetime so the
// task can show the readings and bands it was judged on.
let results = new Map<number, CompletionResult>()
const listeners = new Set<() => void>()

export function rememberResult(taskId: number, result: CompletionResult) {
  results = new Map(results).set(taskId, result)
  listeners.forEach((l) => l())
}

const subscribe = (listener: () => void) => {
  listeners.add(listener)
  return () => listeners.delete(listener)
}

export function useCompletionResult(taskId: number): CompletionResult | undefined {
  return useSyncExternalStore(subscribe, () => results.get(taskId))
}
