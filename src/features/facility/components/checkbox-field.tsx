import { clsx } from 'clsx'
import { forwardRef, type InputHTMLAttributes } from 'react'

type CheckboxFieldProps = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string }

export const CheckboxField = forwardRef<HTMLInputElement, CheckboxFieldProps>(function CheckboxField({ label, hint, className, ...props }, ref) {
  return (
    <label className={clsx('flex min-h-11 items-start gap-3 self-end py-2 text-tide-800', className)}>
      <input ref={ref} type="checkbox" className="mt-0.5 size-5 shrink-0 accent-tide-700" {...props} />
      <span>
        <span className="font-semibold">{label}</span>
        {hint && <span className="block text-sm text-tide-600">{hint}</span>}
      </span>
    </label>
  )
})
