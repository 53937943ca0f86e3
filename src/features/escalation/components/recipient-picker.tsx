import { X } from 'lucide-react'
import { useId } from 'react'
import type { Recipient } from '#shared/schemas/ladder'
import { ROLE_LABELS, type StaffMember } from '#shared/schemas/person'
import { GROUP_RECIPIENTS } from '../utils/recipient-text'

/** Whom one ladder step notifies: any of the groups, plus named people such as the welfare officer. */
export function RecipientPicker({
  value,
  onChange,
  staff,
  label,
  error,
}: {
  value: Recipient[]
  onChange: (next: Recipient[]) => void
  staff: StaffMember[]
  label: string
  error?: string
}) {
  const id = useId()
  const has = (kind: Recipient['kind']) => value.some((r) => r.kind === kind)
  const named = value.flatMap((r) => (r.kind === 'person' ? [r.personId] : []))
  const toggle = (kind: Exclude<Recipient['kind'], 'person'>, on: boolean) => onChange(on ? [...value, { kind }] : value.filter((r) => r.kind !== kind))
  const nameOf = (personId: number) => staff.find((p) => p.id === personId)?.name ?? `Person #${personId}`

  return (
    <fieldset aria-describedby={error ? `${id}-error` : undefined} className="flex min-w-0 flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-tide-800">{label}</legend>
      <div className="grid gap-x-4 sm:grid-cols-2">
        {GROUP_RECIPIENTS.map((g) => (
          <label key={g.kind} className="flex min-h-11 items-center gap-2 text-tide-900">
            <input type="checkbox" className="size-5 accent-tide-700" checked={has(g.kind)} onChange={(e) => toggle(g.kind, e.target.checked)} />
            {g.label}
          </label>
        ))}
      </div>
      {named.length > 0 && (
        <ul className="flex flex-wrap gap-2">
          {named.map((personId) => (
            <li key={personId} className="inline-flex items-center gap-1 rounded-full bg-tide-100 py-1 pr-1 pl-3 text-sm font-semibold text-tide-900">
              {nameOf(personId)}
              <button
                type="button"
                aria-label={`Remove ${nameOf(personId)}`}
                onClick={() => onChange(value.filter((r) => !(r.kind === 'person' && r.personId === personId)))}
                className="inline-flex size-8 items-center justify-center rounded-full hover:bg-tide-200"
              >
                <X aria-hidden className="size-4" />
              </button>
            </li>
          ))}
        </ul>
      )}
      <select
        aria-label={`${label}: add a named person`}
        value=""
        onChange={(e) => e.target.value && onChange([...value, { kind: 'person', personId: Number(e.target.value) }])}
        className="mt-1 min-h-11 rounded-lg border border-tide-200 bg-white px-3 sm:max-w-xs"
      >
        <option value="">Add a named person…</option>
        {staff
          .filter((p) => !named.includes(p.id))
          .map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({ROLE_LABELS[p.role]})
            </option>
          ))}
      </select>
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
    </fieldset>
  )
}
