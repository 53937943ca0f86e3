import { TriangleAlert } from 'lucide-react'
import { useId, type FormEventHandler, type ReactNode } from 'react'
import { Button } from '../../../components/ui/button'

interface FormShellProps {
  title: string
  submitLabel: string
  pending: boolean
  onSubmit: FormEventHandler<HTMLFormElement>
  onCancel: () => void
  error?: string
  children: ReactNode
}

/** The frame every add/edit form on the Tanks page shares: heading, field grid, summary error, buttons. */
export function FormShell({ title, submitLabel, pending, onSubmit, onCancel, error, children }: FormShellProps) {
  const headingId = useId()
  return (
    <form noValidate aria-labelledby={headingId} onSubmit={onSubmit} className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 shadow-sm">
      <h3 id={headingId} className="text-lg font-bold text-tide-900">
        {title}
      </h3>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">{children}</div>
      {error && (
        <p role="alert" className="flex items-center gap-2 rounded-lg bg-alarm-50 p-3 text-sm font-semibold text-alarm-700">
          <TriangleAlert aria-hidden className="size-4 shrink-0" /> {error}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={pending}>
          {pending ? 'Saving…' : submitLabel}
        </Button>
        <Button type="button" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  )
}
