/**
 * Shares weekly on-call duty so that weekends are spread fairly: each week goes to the
 * eligible person with the fewest weekends so far (ties broken by who had duty least
 * recently, then by the order given). Over any period the counts differ by at most one.
 */
export function planRotation(personIds: number[], weeks: number): number[] {
  if (!personIds.length) throw new Error('Choose at least one person for the rotation')
  const counts = new Map(personIds.map((id) => [id, 0]))
  const lastWeek = new Map(personIds.map((id, i) => [id, -personIds.length + i]))
  const plan: number[] = []
  for (let week = 0; week < weeks; week++) {
    const next = [...personIds].sort((a, b) => counts.get(a)! - counts.get(b)! || lastWeek.get(a)! - lastWeek.get(b)!)[0]
    plan.push(next)
    counts.set(next, counts.get(next)! + 1)
    lastWeek.set(next, week)
  }
  return plan
}
