import { useId, type ReactNode } from 'react'

/** A titled block of the tank page. */
export function PageSection({ title, children }: { title: string; children: ReactNode }) {
  const id = useId()
  return (
    <section aria-labelledby={id} className="flex min-w-0 flex-col gap-2">
      <h2 id={id} className="text-xl font-bold text-tide-900">
        {title}
      </h2>
      {children}
    </section>
  )
}
