import type { UseFormRegisterReturn } from 'react-hook-form'
import { SelectField } from '../../../components/ui/select-field'

export interface Option {
  id: number
  label: string
}

/** Tanks, batches or people: a list to choose several from, registered with the form. */
export function ChooseSeveral({
  label,
  options,
  error,
  registration,
}: {
  label: string
  options: Option[]
  error?: string
  registration: UseFormRegisterReturn
}) {
  return (
    <SelectField label={label} multiple size={Math.min(6, Math.max(3, options.length))} hint="Hold Ctrl or ⌘ to choose several" error={error} {...registration}>
      {options.map((o) => (
        <option key={o.id} value={o.id}>
          {o.label}
        </option>
      ))}
    </SelectField>
  )
}
