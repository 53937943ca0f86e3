import type { z } from 'zod'

/** Lets the browser paint and take input before more work: `scheduler.yield` where there is one, else a macrotask. */
export function yieldToMain(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler
  if (scheduler?.yield) return scheduler.yield()
  return new Promise((resolve) => setTimeout(resolve, 0))
}

/**
 * Checks a long list (`count` items, read by `itemAt`) item by item against its schema and maps each, a slice at a time, yielding
 * between slices: a day of 6,000 board cards checked in one go blocks a phone's main thread for
 * a long task, in slices it never does. Throws the schema's error like `schema.parse`.
 */
export async function parseInSlices<T extends z.ZodType, R>(
  count: number,
  itemAt: (i: number) => unknown,
  schema: T,
  map: (item: z.output<T>) => R,
  sliceSize = 500,
): Promise<R[]> {
  const out: R[] = new Array<R>(count)
  for (let start = 0; start < count; start += sliceSize) {
    if (start > 0) await yieldToMain()
    const end = Math.min(count, start + sliceSize)
    for (let i = start; i < end; i++) out[i] = map(schema.parse(itemAt(i)))
  }
  return out
}
