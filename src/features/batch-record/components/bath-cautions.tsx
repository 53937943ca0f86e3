import { ShieldAlert } from 'lucide-react'
import { BATH_CAUTIONS, PERMANGANATE_CAUTIONS } from '#shared/dosing/bath-dose'

/** The usual cautions, shown with every bath amount. */
export function BathCautions({ permanganate }: { permanganate: boolean }) {
  const cautions = permanganate ? [...BATH_CAUTIONS, ...PERMANGANATE_CAUTIONS] : BATH_CAUTIONS
  return (
    <aside aria-label="Cautions" className="rounded-lg border border-ember-100 bg-ember-50 p-3">
      <p className="flex items-center gap-2 font-semibold text-ember-700">
        <ShieldAlert aria-hidden className="size-5" /> Cautions
      </p>
      <ul className="mt-1 list-disc space-y-1 pl-6 text-sm text-tide-900">
        {cautions.map((c) => <li key={c}>{c}</li>)}
      </ul>
    </aside>
  )
}
