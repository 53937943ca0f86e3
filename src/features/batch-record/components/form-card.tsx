import { Save } from 'lucide-react'
import type { FormEventHandler, ReactNode } from 'react'
import { Button } from '../../../components/ui/button'

/** The frame every record form shares: a heading, the fields, and one big Save. */
export function FormCard({
  title,
  description,
  onSubmit,
  saving,
  saveLabel,
  children,
}: {
  title: string
  description?: string
  onSubmit: FormEventHandler<HTMLFormElement>
  saving: boolean
  saveLabel: string
  children: ReactNode
}) {
  return (
    <form noValidate onSubmit={onSubmit} aria-label={title} className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <div>
        <h3 className="text-lg font-bold text-tide-900">{title}</h3>
        {description && <p className="text-sm text-tide-600">{description}</p>}
      </div>
      {children}
      <Button type="submit" disabled={saving} className="w-full sm:w-auto sm:self-start">
        <Save aria-hidden className="size-5" /> {saving ? 'Saving…' : saveLabel}
      </Button>
    </form>
  )
}
