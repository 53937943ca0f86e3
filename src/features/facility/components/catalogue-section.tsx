import { Plus } from 'lucide-react'
import { useCallback, useEffect, useRef, useState, type ReactNode } from 'react'
import { Button } from '../../../components/ui/button'

interface CatalogueSectionProps<T extends { id: number }> {
  title: string
  description?: string
  addLabel: string
  canEdit: boolean
  renderForm: (item: T | undefined, done: () => void) => ReactNode
  /** The list itself; it gets the function that opens a row in the edit form. */
  children: (edit: (item: T) => void) => ReactNode
  after?: ReactNode
}

type Editing<T> = { item?: T } | null

/** One tab of the Tanks page: heading, an add/edit form on demand, then the list. */
export function CatalogueSection<T extends { id: number }>({ title, description, addLabel, canEdit, renderForm, children, after }: CatalogueSectionProps<T>) {
  const [editing, setEditing] = useState<Editing<T>>(null)
  const formRef = useRef<HTMLDivElement>(null)
  const done = useCallback(() => setEditing(null), [])
  const edit = useCallback((item: T) => setEditing({ item }), [])

  useEffect(() => {
    if (!editing) return
    formRef.current?.scrollIntoView({ block: 'nearest', behavior: 'smooth' })
    formRef.current?.querySelector<HTMLInputElement>('input, select')?.focus({ preventScroll: true })
  }, [editing])

  return (
    <section aria-label={title} className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 className="text-xl font-bold text-tide-900">{title}</h2>
          {description && <p className="max-w-2xl text-sm text-tide-700">{description}</p>}
        </div>
        {canEdit && !editing && (
          <Button onClick={() => setEditing({})}>
            <Plus aria-hidden className="size-5" /> {addLabel}
          </Button>
        )}
      </div>
      {editing && (
        <div ref={formRef} key={editing.item?.id ?? 'new'} className="scroll-mt-4">
          {renderForm(editing.item, done)}
        </div>
      )}
      {children(edit)}
      {after}
    </section>
  )
}
