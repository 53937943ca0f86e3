import { ShieldAlert } from 'lucide-react'
import type { Round } from '#shared/schemas/round'
import { groupByArea } from '../utils/group-by-area'
import { longDate } from '../utils/sheet-format'
import { SheetTask } from './sheet-task'

interface PrintSheetProps {
  round: Round
  sheetFor: string
  facilityName: string
}

/** The paper backup of a round: areas in walking order, every task with boxes to write in. */
export function PrintSheet({ round, sheetFor, facilityName }: PrintSheetProps) {
  const groups = groupByArea(round)
  return (
    <article
      aria-label="Round sheet"
      className="mx-auto w-full max-w-[210mm] rounded-xl bg-white p-4 text-tide-950 shadow-sm ring-1 ring-tide-200 md:p-8 print:max-w-none print:rounded-none print:p-0 print:shadow-none print:ring-0"
    >
      <header className="flex flex-wrap items-end justify-between gap-2 border-b-2 border-tide-900 pb-2 print:border-black">
        <div>
          <h2 className="text-xl font-bold">Round sheet · {sheetFor}</h2>
          <p className="text-sm">
            {longDate(round.date)} · {round.tasks.length} task{round.tasks.length === 1 ? '' : 's'}
          </p>
        </div>
        <p className="text-sm">{facilityName}</p>
      </header>
      <p className="mt-2 text-xs text-tide-800">
        Walk the areas in this order. Write each reading in its box, then initials and the time. A reading outside its ok range: tell the supervisor now, do not
        wait to type the sheet in.
      </p>
      {groups.length === 0 && <p className="mt-4 text-tide-800">No tasks on this sheet.</p>}
      {groups.map((g, i) => (
        <section key={g.key} aria-label={g.area?.name ?? 'Elsewhere'} className="mt-4">
          <h3 className="sheet-area-heading flex items-center gap-2 border-b border-tide-700 pb-1 text-lg font-bold print:border-black">
            <span className="tabular-nums">{i + 1}.</span> {g.area?.name ?? 'Elsewhere'}
            {g.area?.quarantine && (
              <span className="inline-flex items-center gap-1 text-sm font-semibold">
                <ShieldAlert aria-hidden className="size-4" /> Quarantine: walk it last
              </span>
            )}
          </h3>
          <ol className="flex flex-col">
            {g.tasks.map((t) => (
              <SheetTask key={t.id} task={t} timeZone={round.timeZone} />
            ))}
          </ol>
        </section>
      ))}
      <footer className="mt-6 flex flex-wrap gap-x-6 gap-y-2 border-t border-tide-900 pt-2 print:border-black">
        <div className="flex min-w-48 flex-1 items-end gap-1.5 text-xs font-semibold">
          Checked by (supervisor) <span aria-hidden className="h-7 flex-1 border-b border-tide-900 print:border-black" />
        </div>
        <div className="flex w-56 items-end gap-1.5 text-xs font-semibold">
          Typed into Roundtide on <span aria-hidden className="h-7 flex-1 border-b border-tide-900 print:border-black" />
        </div>
      </footer>
    </article>
  )
}
