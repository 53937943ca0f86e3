import { useId } from 'react'

interface ReportSelectProps<T extends string> {
  label: string
  value: T
  options: ReadonlyArray<{ value: T; label: string }>
  onChange: (value: T) => void
}

export function ReportSelect<T extends string>({ label, value, options, onChange }: ReportSelectProps<T>) {
  const id = useId()
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-tide-800">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(options.find((o) => o.value === e.target.value)?.value ?? value)}
        className="min-h-11 rounded-lg border border-tide-200 bg-white px-3 text-base"
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  )
}
