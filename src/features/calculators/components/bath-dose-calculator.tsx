import { useState } from 'react'
import { bathDose, stockVolumeForBath } from '#shared/dosing/bath-dose'
import { attempt, formatAmount, parseDecimal } from '../utils/numbers'
import { BathCautions } from '../../../components/ui/bath-cautions'
import { NumberInput } from './number-input'
import { PublishedBaths } from './published-baths'
import { ResultBox } from './result-box'

/** Grams of product (or millilitres of stock) for a static bath at the figures entered. */
export function BathDoseCalculator() {
  const [v, setV] = useState({ target: '', volume: '', purity: '100', minutes: '', stock: '' })
  const [useStock, setUseStock] = useState(false)
  const set = (key: keyof typeof v) => (value: string) => setV((old) => ({ ...old, [key]: value }))
  const [target, volume, purity, minutes, stock] = [v.target, v.volume, v.purity, v.minutes, v.stock].map(parseDecimal)
  const missing = target === null || volume === null || purity === null || (useStock && stock === null)
  const result = missing
    ? null
    : attempt(() => ({
        dose: bathDose({ targetMgPerL: target, bathVolumeL: volume, purityPercent: purity, durationMinutes: minutes ?? undefined }),
        stock: useStock ? stockVolumeForBath(target, volume, { gPerL: stock! }) : null,
      }))

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <section aria-labelledby="bath-heading" className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
        <div>
          <h2 id="bath-heading" className="text-lg font-bold text-tide-900">
            Bath dose
          </h2>
          <p className="text-sm text-tide-600">
            Arithmetic for a static bath. Which product, strength and time is the veterinarian’s call, with the label or permit.
          </p>
        </div>
        <div className="grid grid-cols-2 gap-3">
          <NumberInput label="Target (mg/L)" value={v.target} onChange={set('target')} />
          <NumberInput label="Bath volume (L)" value={v.volume} onChange={set('volume')} />
          <NumberInput label="Product purity (%)" value={v.purity} onChange={set('purity')} hint="100 for a pure product" />
          <NumberInput label="Duration (min)" value={v.minutes} onChange={set('minutes')} hint="For the record; a static bath needs the same amount" />
        </div>
        <label className="flex min-h-11 items-center gap-3">
          <input type="checkbox" className="size-5" checked={useStock} onChange={(e) => setUseStock(e.target.checked)} />
          <span className="text-tide-900">Add it as a stock solution</span>
        </label>
        {useStock && <NumberInput label="Stock strength (g/L active = mg/mL)" value={v.stock} onChange={set('stock')} />}
        <ResultBox missing={missing} error={result?.error ?? null}>
          {result?.value && (
            <>
              <p className="text-sm font-semibold text-tide-700">Amount for the figures you entered</p>
              <p className="text-2xl font-bold tabular-nums text-tide-900" data-testid="bath-grams">
                {formatAmount(result.value.dose.productG)} g of product
              </p>
              <p className="text-sm text-tide-700">
                {formatAmount(result.value.dose.activeIngredientG)} g active ingredient in {volume} L{minutes ? `, ${minutes} min` : ''}.
              </p>
              {result.value.stock && (
                <p className="mt-2 text-tide-900">
                  or <strong className="tabular-nums">{formatAmount(result.value.stock.stockMl)} mL</strong> of a {stock} g/L stock
                  <span className="block text-sm text-tide-700">
                    Taken as small beside the bath; for a large addition enter the final volume as the bath volume.
                  </span>
                </p>
              )}
            </>
          )}
        </ResultBox>
        <BathCautions />
      </section>
      <PublishedBaths />
    </div>
  )
}
