import type { Recipient } from '#shared/schemas/ladder'

export const GROUP_RECIPIENTS = [
  { kind: 'assignee', label: 'The assignee' },
  { kind: 'on_shift', label: 'Whoever is on shift' },
  { kind: 'on_call', label: 'Whoever is on call' },
  { kind: 'supervisors', label: 'All supervisors' },
  { kind: 'managers', label: 'All managers' },
] as const

export function describeRecipient(r: Recipient, names: Map<number, string>) {
  if (r.kind === 'person') return names.get(r.personId) ?? `person #${r.personId}`
  return GROUP_RECIPIENTS.find((g) => g.kind === r.kind)!.label.toLowerCase()
}

export const describeDelay = (minutes: number) =>
  minutes === 0
    ? 'At once'
    : minutes % 60 === 0
      ? `After ${minutes / 60} h`
      : minutes > 60
        ? `After ${Math.floor(minutes / 60)} h ${minutes % 60} min`
        : `After ${minutes} min`
