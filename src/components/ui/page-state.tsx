import { Loader2, TriangleAlert } from 'lucide-react'
import type { ReactNode } from 'react'

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-2 p-6 text-tide-700">
      <Loader2 aria-hidden className="size-5 animate-spin" /> {label}
    </div>
  )
}

export function ErrorState({ title, message, action }: { title: string; message: string; action?: ReactNode }) {
  return (
    <div role="alert" className="m-4 rounded-xl border border-alarm-100 bg-alarm-50 p-4 text-alarm-700">
      <p className="flex items-center gap-2 font-semibold">
        <TriangleAlert aria-hidden className="size-5" /> {title}
      </p>
      <p className="mt-1 text-sm">{message}</p>
      {action && <div className="mt-3">{action}</div>}
    </div>
  )
}

export function PageHeader({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <header className="mb-4 flex flex-wrap items-end justify-between gap-3">
      <h1 className="text-2xl font-bold text-tide-900">{title}</h1>
      {children}
    </header>
  )
}
