import { clsx } from 'clsx'
import { useId, type ReactNode } from 'react'

export function FormSection({ title, description, className, children }: { title: string; description?: string; className?: string; children: ReactNode }) {
  const id = useId()
  return (
    <section aria-labelledby={id} className="min-w-0 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <h2 id={id} className="text-lg font-bold text-tide-900">
        {title}
      </h2>
      {description && <p className="mt-0.5 text-sm text-tide-600">{description}</p>}
      <div className={clsx('mt-4 grid gap-4', className)}>{children}</div>
    </section>
  )
}
