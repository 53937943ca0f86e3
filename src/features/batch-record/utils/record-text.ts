import type { BatchRecord } from '#shared/schemas/batch-record'

export type RecordText = { title: string; lines: string[]; warnings: string[] }

const n = (value: unknown, decimals?: number) =>
  typeof value === 'number' && Number.isFinite(value) ? (decimals === undefined ? String(value) : value.toFixed(decimals)) : '–'

/** What a stored record says, in short lines; the server kept what the form showed at the time. */
export function describeRecord(r: BatchRecord): RecordText {
  const d = r.data
  switch (r.kind) {
    case 'transport_box':
      return {
        title: `Transport box check: ${String(d.box ?? '')}`,
        lines: [`Box ${n(d.tempC)} °C, pH ${n(d.pH)}, DO ${n(d.doMgL)} mg/L`, `Receiving ${n(d.receivingTempC)} °C, pH ${n(d.receivingPH)}`],
        warnings: Array.isArray(d.warnings) ? d.warnings.map(String) : [],
      }
    case 'transport_water':
      return {
        title: 'Transport-water test',
        lines: [
          `${n(d.tempC)} °C, pH ${n(d.pH)}, salinity ${n(d.salinity)} g/kg`,
          `TAN ${n(d.tanMgL)} mg/L → NH3-N ${n(d.nh3MgL)} mg/L; nitrite-N ${n(d.nitriteMgL)} mg/L; alkalinity ${n(d.alkalinityMgL)} mg/L`,
        ],
        warnings: [],
      }
    case 'weighing':
      return {
        title: `Sample weighing, ${n(d.n)} fish`,
        lines: [
          `Mean ${n(d.mean, 2)} g, SD ${n(d.sd, 2)} g, CV ${typeof d.cv === 'number' ? (d.cv * 100).toFixed(1) : '–'} %`,
          `Range ${n(d.min)}–${n(d.max)} g${d.updateBatchMean ? ' · set the batch mean weight' : ''}`,
        ],
        warnings: [],
      }
    case 'bath':
      return {
        title: `Bath: ${String(d.product ?? '')}`,
        lines: [
          `${n(d.targetMgL)} mg/L in ${n(d.volumeL)} L for ${n(d.minutes)} min; ${n(d.gramsWeighed)} g weighed (purity ${n(d.purityPct)} %)`,
          ...(d.observations ? [String(d.observations)] : []),
        ],
        warnings: [],
      }
    case 'review':
      return { title: 'Review', lines: [String(d.text ?? '')], warnings: [] }
    default:
      return { title: 'Note', lines: [String(d.text ?? '')], warnings: [] }
  }
}
