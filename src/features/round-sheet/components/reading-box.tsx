import { describeOkRange } from '#shared/readings/band'
import type { ReadingSpec } from '#shared/schemas/round'

/** An empty box to write one reading in, named with its unit and ok range. */
export function ReadingBox({ spec }: { spec: ReadingSpec }) {
  const range = describeOkRange(spec)
  return (
    <div className="flex min-w-0 flex-col rounded-md border border-tide-700 print:border-black">
      <p className="flex flex-wrap items-baseline justify-between gap-x-2 border-b border-tide-300 px-1.5 py-0.5 text-xs leading-tight">
        <span className="font-semibold text-tide-950">{spec.name}</span>
        <span className="text-tide-800">{range ? `ok ${range}` : 'no limit'}</span>
      </p>
      <div className="flex h-9 items-end justify-end px-1.5 pb-0.5 text-xs text-tide-700">{spec.unit}</div>
    </div>
  )
}
