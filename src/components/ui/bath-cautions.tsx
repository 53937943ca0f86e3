import { ShieldAlert } from 'lucide-react'
import { BATH_CAUTIONS, PERMANGANATE_CAUTIONS } from '#shared/dosing/bath-dose'

/**
 * The usual cautions, always on screen beside a bath amount. `permanganate`: show only the
 * general cautions plus permanganate's when it is the product (a record); leave it out to list
 * both groups under their own headings (the calculator, where the product can still change).
 */
export function BathCautions({ permanganate }: { permanganate?: boolean }) {
  const general = permanganate ? [...BATH_CAUTIONS, ...PERMANGANATE_CAUTIONS] : BATH_CAUTIONS
  return (
    <aside aria-label="Cautions" className="rounded-lg border border-ember-100 bg-ember-50 p-3">
      <p className="flex items-center gap-2 font-semibold text-ember-700">
        <ShieldAlert aria-hidden className="size-5" /> Cautions
      </p>
      <ul className="mt-1 list-disc space-y-1 pl-6 text-sm text-tide-900">
        {general.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      {permanganate === undefined && (
        <>
          <p className="mt-2 text-sm font-semibold text-tide-900">Potassium permanganate</p>
          <ul className="mt-1 list-disc space-y-1 pl-6 text-sm text-tide-900">
            {PERMANGANATE_CAUTIONS.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </>
      )}
    </aside>
  )
}
