/**
 * A pause for long synchronous work done in pieces: it resolves at once until `sliceMs` have
 * passed since the last turn given away, then lets waiting requests, I/O and timers run first
 * (setImmediate). Small jobs never wait; a large one holds the event loop for about one slice
 * plus one piece at a time.
 */
export function eventLoopSlices(sliceMs = 10): () => Promise<void> {
  let sliceStart = performance.now()
  return async () => {
    if (performance.now() - sliceStart < sliceMs) return
    await new Promise<void>((resolve) => setImmediate(resolve))
    sliceStart = performance.now()
  }
}
