import { PH_DIFFERENCE_LIMIT, type WaterComparison as Comparison } from '#shared/arrival/compare-water'
import { Notice } from './notice'

/** The box-versus-receiving check, live as the readings are typed. */
export function WaterComparison({ comparison, tempLimitC }: { comparison: Comparison | null; tempLimitC: number }) {
  return (
    <div aria-live="polite" className="flex flex-col gap-2">
      {!comparison && <Notice tone="info">Enter both temperatures and both pH values to compare the box with the receiving water.</Notice>}
      {comparison && comparison.warnings.length === 0 && (
        <Notice tone="ok">
          Within the limits: {Math.abs(comparison.tempDifferenceC)} °C apart (limit {tempLimitC} °C), pH {Math.abs(comparison.pHDifference)} apart (limit{' '}
          {PH_DIFFERENCE_LIMIT}).
        </Notice>
      )}
      {comparison?.warnings.map((w) => (
        <Notice key={w} tone="watch">
          {w}
        </Notice>
      ))}
      <p className="text-sm text-tide-600">
        These limits are prompts, not rules for any species: temper gradually and follow the supplier’s and the veterinarian’s advice.
      </p>
    </div>
  )
}
