import { ChevronUp, Plus } from 'lucide-react'
import { useId, useState, type ReactNode } from 'react'
import type { Movement, StockFigures as Figures } from '#shared/schemas/stock'
import { Button } from '../../../components/ui/button'
import type { LedgerView } from '../utils/movement-text'
import { MovementLedger } from './movement-ledger'
import { StockFigures, type FigureRow } from './stock-figures'

interface Props {
  figures: Figures
  rows: FigureRow[]
  rowsLabel: string
  emptyText: string
  movements: Movement[]
  view: LedgerView
  timeZone: string
  /** The movement form, for the people who may record one. */
  form: ReactNode | null
}

/** The stock part of a tank or batch page: the figures, the way to record a movement, and the register. */
export function StockRegisterSection({ figures, rows, rowsLabel, emptyText, movements, view, timeZone, form }: Props) {
  const [open, setOpen] = useState(false)
  const formId = useId()
  return (
    <section aria-labelledby={`${formId}-heading`} className="flex min-w-0 flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={`${formId}-heading`} className="text-xl font-bold text-tide-900">
          Stock register
        </h2>
        {form && (
          <Button variant={open ? 'secondary' : 'primary'} aria-expanded={open} aria-controls={formId} onClick={() => setOpen((o) => !o)}>
            {open ? <ChevronUp aria-hidden className="size-5" /> : <Plus aria-hidden className="size-5" />} {open ? 'Close the form' : 'Record a movement'}
          </Button>
        )}
      </div>
      <StockFigures figures={figures} rows={rows} rowsLabel={rowsLabel} emptyText={emptyText} />
      <div id={formId} hidden={!open}>
        {open && form}
      </div>
      <h3 className="text-lg font-bold text-tide-900">Movements</h3>
      <MovementLedger movements={movements} view={view} timeZone={timeZone} />
    </section>
  )
}
