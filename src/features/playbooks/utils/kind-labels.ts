import type { EventKind } from '#shared/schemas/playbook'

export const EVENT_KIND_LABELS: Record<EventKind, string> = {
  arrival: 'Arrival',
  transfer: 'Transfer',
  grading: 'Grading',
  weighing: 'Weighing',
  sampling: 'Sampling',
  harvest: 'Harvest',
  dispatch: 'Dispatch',
  treatment: 'Treatment',
  other: 'Other',
}
