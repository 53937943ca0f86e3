import type { TrendParameter } from '../utils/trend-series'
import { ToggleChip } from './toggle-chip'

interface ParameterChoiceProps {
  parameters: TrendParameter[]
  selected: string[]
  onChange: (keys: string[]) => void
}

/** Which parameters get a chart: measured ones, and the values Roundtide works out from them. */
export function ParameterChoice({ parameters, selected, onChange }: ParameterChoiceProps) {
  const toggle = (key: string) => onChange(selected.includes(key) ? selected.filter((k) => k !== key) : [...selected, key])
  const groups = [
    { label: 'Measured', items: parameters.filter((p) => !p.limit.derived) },
    { label: 'Worked out', items: parameters.filter((p) => p.limit.derived) },
  ].filter((g) => g.items.length > 0)
  return (
    <div className="flex flex-col gap-2 print:hidden">
      {groups.map((g) => (
        <div key={g.label} role="group" aria-label={`${g.label} readings`} className="flex flex-wrap items-center gap-2">
          <span className="w-24 text-sm font-semibold text-tide-800">{g.label}</span>
          {g.items.map((p) => (
            <ToggleChip key={p.limit.key} label={p.limit.name} pressed={selected.includes(p.limit.key)} onClick={() => toggle(p.limit.key)} />
          ))}
        </div>
      ))}
    </div>
  )
}
