import { clsx } from 'clsx'
import { Code, ListChecks } from 'lucide-react'

export type RuleMode = 'builder' | 'raw'

const MODES = [
  { value: 'builder', label: 'Builder', icon: ListChecks },
  { value: 'raw', label: 'Written rule', icon: Code },
] as const

export function RuleModeSwitch({ mode, onChange }: { mode: RuleMode; onChange: (mode: RuleMode) => void }) {
  return (
    <div role="group" aria-label="How to set the schedule" className="inline-flex justify-self-start rounded-lg bg-tide-100 p-1">
      {MODES.map((m) => (
        <button
          key={m.value}
          type="button"
          aria-pressed={mode === m.value}
          onClick={() => onChange(m.value)}
          className={clsx(
            'inline-flex min-h-11 items-center gap-2 rounded-md px-3 font-semibold',
            mode === m.value ? 'bg-white text-tide-900 shadow-sm' : 'text-tide-700 hover:text-tide-900',
          )}
        >
          <m.icon aria-hidden className="size-4" /> {m.label}
        </button>
      ))}
    </div>
  )
}
