import { CircleAlert } from 'lucide-react'
import type { ReactNode } from 'react'
import { Button } from '../../../components/ui/button'

/** Submit and cancel, with the server's message when it refused the save for a reason no field shows. */
export function FormFooter({
  submitLabel,
  pending,
  serverError,
  onCancel,
  children,
}: {
  submitLabel: string
  pending: boolean
  serverError?: string
  onCancel?: () => void
  children?: ReactNode
}) {
  return (
    <div className="flex flex-col gap-2 sm:col-span-full">
      {serverError && (
        <p role="alert" className="flex items-start gap-2 text-sm font-semibold text-alarm-700">
          <CircleAlert aria-hidden className="mt-0.5 size-4 shrink-0" /> {serverError}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={pending}>
          {pending ? 'Saving…' : submitLabel}
        </Button>
        {onCancel && (
          <Button type="button" variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        )}
        {children}
      </div>
    </div>
  )
}
