import { stepOccurrences } from '#shared/playbooks/step-times'
import type { PlaybookStep } from '#shared/schemas/playbook'

export type PreviewLine = {
  title: string
  first: string
  last: string
  /** Occurrences of the step: more than one for a daily step. */
  times: number
  /** Tasks per occurrence: one per tank, or one for the event. */
  perOccurrence: number
}

/** The tasks an event will create, step by step, in facility wall time; mirrors the server's planning. */
export function previewEventTasks(steps: PlaybookStep[], localStart: string, zone: string, tankCount: number) {
  const lines: PreviewLine[] = []
  for (const step of steps) {
    const occurrences = stepOccurrences(step, localStart, zone)
    if (!occurrences.length) continue
    lines.push({
      title: step.title,
      first: occurrences[0].local,
      last: occurrences[occurrences.length - 1].local,
      times: occurrences.length,
      perOccurrence: step.perTank ? tankCount : Math.min(tankCount, 1),
    })
  }
  lines.sort((a, b) => a.first.localeCompare(b.first))
  return { lines, total: lines.reduce((sum, l) => sum + l.times * l.perOccurrence, 0) }
}
