import { Field } from '../../../components/ui/field'

/** A decimal box kept as text, so a half-typed "2." is not lost. */
export function NumberInput({ label, value, onChange, hint }: { label: string; value: string; onChange: (value: string) => void; hint?: string }) {
  return <Field label={label} value={value} onChange={(e) => onChange(e.target.value)} inputMode="decimal" autoComplete="off" hint={hint} />
}
