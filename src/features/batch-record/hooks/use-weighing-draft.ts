import { useEffect, useState } from 'react'
import type { WeightEntry } from '../utils/weights'

const keyFor = (batchId: number) => `roundtide:weighing:${batchId}`

function read(batchId: number): WeightEntry[] {
  try {
    const stored: unknown = JSON.parse(sessionStorage.getItem(keyFor(batchId)) ?? '[]')
    return Array.isArray(stored)
      ? stored.filter((e): e is WeightEntry => typeof e?.id === 'number' && typeof e?.grams === 'number' && typeof e?.decimals === 'number')
      : []
  } catch {
    return []
  }
}

/** The weights typed so far survive a reload or a trip to another page until they are saved. */
export function useWeighingDraft(batchId: number) {
  const [entries, setEntries] = useState<WeightEntry[]>(() => read(batchId))
  useEffect(() => {
    if (entries.length) sessionStorage.setItem(keyFor(batchId), JSON.stringify(entries))
    else sessionStorage.removeItem(keyFor(batchId))
  }, [batchId, entries])
  return [entries, setEntries] as const
}
