import { clsx } from 'clsx'
import { CircleAlert } from 'lucide-react'

/** Why the server refused a form (or could not be reached), under the fields it keeps as typed. */
export function FormRefusal({ message, className }: { message: string | null; className?: string }) {
  if (!message) return null
  return (
    <p role="alert" className={clsx('flex items-start gap-2 rounded-xl bg-alarm-50 p-3 font-semibold text-alarm-700', className)}>
      <CircleAlert aria-hidden className="mt-0.5 size-5 shrink-0" /> {message}
    </p>
  )
}
