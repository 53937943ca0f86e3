import { clsx } from 'clsx'
import { forwardRef, useId, type InputHTMLAttributes, type ReactNode } from 'react'

type FieldProps = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: ReactNode }

/** A labelled input with its error under it, tied together for screen readers. */
export const Field = forwardRef<HTMLInputElement, FieldProps>(function Field({ label, error, hint, className, ...props }, ref) {
  const id = useId()
  return (
    <div className={clsx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-tide-800">
        {label}
      </label>
      <input
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={clsx('min-h-11 rounded-lg border bg-white px-3 text-base', error ? 'border-alarm-500' : 'border-tide-200 focus:border-tide-500')}
        {...props}
      />
      {hint && !error && <p className="text-sm text-tide-600">{hint}</p>}
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
    </div>
  )
})
