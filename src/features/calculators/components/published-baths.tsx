import { BookMarked } from 'lucide-react'
import { PUBLISHED_PERMANGANATE_BATHS } from '#shared/dosing/bath-dose'

const figure = (mgPerL: number | null, upTo: number | null) =>
  mgPerL === null ? (upTo === null ? 'rule' : `rule, at most ${upTo} mg/L`) : upTo === null ? `${mgPerL} mg/L` : `${mgPerL} mg/L, up to ${upTo} mg/L in total`

/** What published sources print for potassium permanganate baths, with the sources themselves. */
export function PublishedBaths() {
  const sources = [...new Set(PUBLISHED_PERMANGANATE_BATHS.map((b) => b.source))]
  return (
    <section aria-labelledby="published-heading" className="rounded-xl border border-tide-200 bg-white p-4 lg:self-start">
      <h3 id="published-heading" className="flex items-center gap-2 font-bold text-tide-900">
        <BookMarked aria-hidden className="size-5 text-tide-600" /> Published figures: potassium permanganate
      </h3>
      <p className="text-sm text-tide-600">What the sources print, for reference; not a recommendation for your fish, system or water.</p>
      <ul className="mt-2 divide-y divide-tide-100">
        {PUBLISHED_PERMANGANATE_BATHS.map((b) => (
          <li key={b.id} className="py-2 text-sm">
            <p className="font-semibold text-tide-900">{b.use}</p>
            <p className="text-tide-800">
              {figure(b.mgPerL, b.upToMgPerL)} · {b.duration}
            </p>
            <p className="text-tide-700">
              {b.details} <span className="text-tide-600">[{sources.indexOf(b.source) + 1}]</span>
            </p>
          </li>
        ))}
      </ul>
      <ol className="mt-2 list-decimal space-y-1 pl-5 text-xs text-tide-700">
        {sources.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ol>
    </section>
  )
}
