import type { Playbook, PlaybookInput } from '#shared/schemas/playbook'

export type StepInput = PlaybookInput['steps'][number]

export const newStep = (): StepInput => ({
  title: '',
  category: 'welfare',
  instructions: '',
  dayOffset: 0,
  time: null,
  minutesOffset: 0,
  repeatDays: 1,
  perTank: true,
  durationMinutes: 10,
  graceMinutes: 60,
  priority: 'routine',
  assigneeRule: { kind: 'none' },
  requiredReadings: [],
  ladderId: null,
})

export const newPlaybookValues = (): PlaybookInput => ({ name: '', kind: 'other', description: '', fastingHours: 0, steps: [newStep()] })

/** Editing keeps the step settings this form does not show (assignee, readings, ladder). */
export const playbookValues = (p: Playbook): PlaybookInput => ({
  name: p.name,
  kind: p.kind,
  description: p.description,
  fastingHours: p.fastingHours,
  steps: p.steps.map((s) => ({ ...s })),
})

/** Number inputs: an empty box is "not given", which the schema reports, rather than 0. */
export const asNumber = (value: unknown) => (value === '' || value === null ? Number.NaN : Number(value))
export const asTimeOrNull = (value: unknown) => (value === '' || value === undefined ? null : value)
