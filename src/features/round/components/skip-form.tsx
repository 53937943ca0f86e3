import { clsx } from 'clsx'
import { useId } from 'react'
import { SKIP_REASONS, SKIP_REASON_LABELS } from '#shared/schemas/completion'
import type { Draft } from '../state/drafts'

/** "Can't do": one reason from the list, and words of their own (required for Other). */
export function SkipForm({ draft, onChange }: { draft: Draft; onChange: (patch: Partial<Draft>) => void }) {
  const id = useId()
  return (
    <div className="flex flex-col gap-3">
      <fieldset aria-describedby={draft.errors.skipReason ? `${id}-reason-error` : undefined}>
        <legend className="mb-2 font-semibold text-tide-900">Why can't it be done?</legend>
        <div className="grid gap-2">
          {SKIP_REASONS.map((reason) => (
            <label
              key={reason}
              className={clsx(
                'flex min-h-12 items-center gap-3 rounded-xl border-2 px-3 font-semibold',
                draft.skipReason === reason ? 'border-tide-600 bg-tide-50 text-tide-900' : 'border-tide-200 bg-white text-tide-800',
              )}
            >
              <input
                type="radio"
                name={`${id}-reason`}
                value={reason}
                checked={draft.skipReason === reason}
                onChange={() => onChange({ skipReason: reason, errors: {} })}
                className="size-5 accent-tide-700"
              />
              {SKIP_REASON_LABELS[reason]}
            </label>
          ))}
        </div>
        {draft.errors.skipReason && (
          <p id={`${id}-reason-error`} className="mt-1 text-sm font-semibold text-alarm-700">
            {draft.errors.skipReason}
          </p>
        )}
      </fieldset>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-note`} className="font-semibold text-tide-900">
          In your words {draft.skipReason === 'other' ? '(required)' : '(optional)'}
        </label>
        <textarea
          id={`${id}-note`}
          rows={2}
          value={draft.note}
          onChange={(e) => onChange({ note: e.target.value })}
          aria-invalid={draft.errors.note ? true : undefined}
          className="rounded-xl border-2 border-tide-200 bg-white p-3 text-base focus:border-tide-500 focus:outline-none"
        />
        {draft.errors.note && <p className="text-sm font-semibold text-alarm-700">{draft.errors.note}</p>}
      </div>
    </div>
  )
}
