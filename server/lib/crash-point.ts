/** The points where the reliability tests may end the process (record 13c). */
export type CrashPoint = 'after-commit' | 'after-claim'

/**
 * Reliability tests only (ROUNDTIDE_RELIABILITY=1): `ROUNDTIDE_CRASH_AT="after-commit /completion$"`
 * SIGKILLs the process at that point when `detail` (a request path) matches the pattern, so a
 * test can prove what a crash there leaves behind. Does nothing otherwise.
 */
export function crashPoint(point: CrashPoint, detail = '') {
  if (process.env.ROUNDTIDE_RELIABILITY !== '1' || !process.env.ROUNDTIDE_CRASH_AT) return
  const [wanted, pattern] = process.env.ROUNDTIDE_CRASH_AT.split(' ')
  if (wanted !== point || (pattern && !new RegExp(pattern).test(detail))) return
  process.kill(process.pid, 'SIGKILL')
}
