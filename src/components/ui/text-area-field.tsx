import { clsx } from 'clsx'
import { forwardRef, useId, type TextareaHTMLAttributes } from 'react'

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string }

/** A labelled text area with its error under it, like the Field input. */
export const TextAreaField = forwardRef<HTMLTextAreaElement, Props>(function TextAreaField({ label, error, className, ...props }, ref) {
  const id = useId()
  return (
    <div className={clsx('flex min-w-0 flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-tide-800">
        {label}
      </label>
      <textarea
        ref={ref}
        id={id}
        rows={2}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={clsx('rounded-lg border bg-white px-3 py-2 text-base', error ? 'border-alarm-500' : 'border-tide-200')}
        {...props}
      />
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
    </div>
  )
})
