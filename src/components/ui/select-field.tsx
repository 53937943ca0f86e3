import { clsx } from 'clsx'
import { forwardRef, useId, type ReactNode, type SelectHTMLAttributes } from 'react'

type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string; hint?: ReactNode }

/** A labelled select with its error under it, like the Field input. */
export const SelectField = forwardRef<HTMLSelectElement, SelectFieldProps>(function SelectField({ label, error, hint, className, children, ...props }, ref) {
  const id = useId()
  return (
    <div className={clsx('flex min-w-0 flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-tide-800">
        {label}
      </label>
      <select
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={clsx('min-h-11 w-full rounded-lg border bg-white px-3 text-base', error ? 'border-alarm-500' : 'border-tide-200')}
        {...props}
      >
        {children}
      </select>
      {hint && !error && <p className="text-sm text-tide-600">{hint}</p>}
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
    </div>
  )
})
