import { useState } from 'react'
import { planDailyRation } from '#shared/feeding/ration'
import { attempt, formatAmount, parseDecimal } from '../utils/numbers'
import { NumberInput } from './number-input'
import { ResultBox } from './result-box'
import { SelectField } from '../../../components/ui/select-field'

/** A day's feed from head count, mean weight and feeding rate, split into equal feeds. */
export function RationCalculator() {
  const [v, setV] = useState({ count: '', weight: '', rate: '', feeds: '3' })
  const [scale, setScale] = useState(1)
  const set = (key: keyof typeof v) => (value: string) => setV((old) => ({ ...old, [key]: value }))
  const [count, weight, rate, feeds] = [v.count, v.weight, v.rate, v.feeds].map(parseDecimal)
  const missing = count === null || weight === null || rate === null || feeds === null
  const result = missing ? null : attempt(() => planDailyRation({ count, meanWeightG: weight, ratePercentPerDay: rate, feeds, scaleDecimals: scale }))

  return (
    <section aria-labelledby="ration-heading" className="flex max-w-2xl flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <h2 id="ration-heading" className="text-lg font-bold text-tide-900">
        Daily ration
      </h2>
      <div className="grid grid-cols-2 gap-3">
        <NumberInput label="Number of fish" value={v.count} onChange={set('count')} />
        <NumberInput label="Mean weight (g)" value={v.weight} onChange={set('weight')} />
        <NumberInput label="Feeding rate (% body weight/day)" value={v.rate} onChange={set('rate')} />
        <NumberInput label="Feeds per day" value={v.feeds} onChange={set('feeds')} />
        <SelectField label="Scale reads to" value={scale} onChange={(e) => setScale(Number(e.target.value))}>
          <option value={0}>1 g</option>
          <option value={1}>0.1 g</option>
          <option value={2}>0.01 g</option>
        </SelectField>
      </div>
      <ResultBox missing={missing} error={result?.error ?? null}>
        {result?.value && (
          <>
            <p className="text-sm font-semibold text-tide-700">Per feed</p>
            <p className="text-2xl font-bold tabular-nums text-tide-900" data-testid="ration-per-feed">
              {[...new Set(result.value.perFeedG)].map((g) => `${g.toFixed(scale)} g`).join(' or ')}
            </p>
            <p className="text-sm text-tide-700">
              {result.value.dailyG.toFixed(scale)} g a day in {result.value.perFeedG.length} feeds (
              {result.value.perFeedG.map((g) => g.toFixed(scale)).join(' + ')}) for {formatAmount(result.value.biomassKg)} kg of fish.
            </p>
          </>
        )}
      </ResultBox>
      <p className="text-sm text-tide-600">
        The rate comes from your feeding table or protocol. Adjust for appetite, temperature and water quality, and hold feeds in a fasting window.
      </p>
    </section>
  )
}
