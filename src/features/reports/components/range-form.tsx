import { Search } from 'lucide-react'
import { useState, type FormEvent } from 'react'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { rangeProblem } from '../utils/date-range'
import type { DateRange } from '../utils/report-paths'

/** From and to dates; the report changes when the person asks, not on every keystroke. Key it by the range to reset. */
export function RangeForm({ range, onChange }: { range: DateRange; onChange: (range: DateRange) => void }) {
  const [draft, setDraft] = useState(range)
  const problem = draft.from && draft.to ? rangeProblem(draft) : 'Choose both dates.'
  const submit = (e: FormEvent) => {
    e.preventDefault()
    if (!problem) onChange(draft)
  }
  return (
    <form aria-label="Report range" onSubmit={submit} className="flex flex-wrap items-end gap-3 print:hidden">
      <Field label="From" type="date" value={draft.from} onChange={(e) => setDraft({ ...draft, from: e.target.value })} className="w-44" />
      <Field
        label="To"
        type="date"
        value={draft.to}
        onChange={(e) => setDraft({ ...draft, to: e.target.value })}
        className="w-44"
        error={draft.from && draft.to ? (problem ?? undefined) : undefined}
      />
      <Button type="submit" variant="secondary" disabled={!!problem}>
        <Search aria-hidden className="size-4" /> Show
      </Button>
    </form>
  )
}
