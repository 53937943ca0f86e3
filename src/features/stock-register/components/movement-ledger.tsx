import { useState } from 'react'
import type { Movement } from '#shared/schemas/stock'
import { Button } from '../../../components/ui/button'
import type { LedgerView } from '../utils/movement-text'
import { MovementEntry } from './movement-entry'

const FIRST = 40

/** The register newest first (the server's order); it is only ever added to, so corrections are rows of their own. */
export function MovementLedger({ movements, view, timeZone }: { movements: Movement[]; view: LedgerView; timeZone: string }) {
  const [all, setAll] = useState(false)
  if (movements.length === 0) {
    return (
      <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
        Nothing on the stock register yet: the first entry is the arrival.
      </p>
    )
  }
  const byId = new Map(movements.map((m) => [m.id, m]))
  const corrections = new Map<number, Movement[]>()
  for (const m of movements) if (m.correctsId) corrections.set(m.correctsId, [...(corrections.get(m.correctsId) ?? []), m])
  const shown = all ? movements : movements.slice(0, FIRST)
  return (
    <div className="rounded-xl border border-tide-200 bg-white px-4 py-2">
      <ol aria-label="Stock register, newest first" className="flex flex-col">
        {shown.map((m) => (
          <MovementEntry
            key={m.id}
            movement={m}
            view={view}
            timeZone={timeZone}
            corrected={m.correctsId ? byId.get(m.correctsId) : undefined}
            correctedBy={corrections.get(m.id) ?? []}
          />
        ))}
      </ol>
      {!all && movements.length > FIRST && (
        <Button variant="ghost" onClick={() => setAll(true)} className="my-2">
          Show all {movements.length} entries
        </Button>
      )}
    </div>
  )
}
