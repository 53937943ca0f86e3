import { AMMONIA_METHOD_NAMES, ammoniaMethodFor, unionizedAmmoniaMgL } from '#shared/water/ammonia'
import { Notice } from './notice'

// mg/L as N to mg/L as NH3: molar masses of NH3 and N.
const NH3_PER_N = 17.031 / 14.007

const NOTES = {
  freshwater: 'Fresh-water method (salinity 0), valid 0–50 °C; pH as read on a meter calibrated with ordinary buffers.',
  saline:
    'Saline method (salinity above 0), valid −2 to 40 °C and salinity 0–40: pH must be on the total scale. A meter calibrated with ordinary (NBS) buffers reads brackish and sea water differently, and 0.1 pH unit changes NH3 by about 25 %.',
} as const

type Inputs = { tanMgL: number | null; pH: number | null; tempC: number | null; salinity: number | null }

/** Un-ionised ammonia of the transport water, worked out live with the method the salinity calls for. */
export function AmmoniaResult({ tanMgL, pH, tempC, salinity }: Inputs) {
  if (tanMgL === null || pH === null || tempC === null || salinity === null) {
    return <Notice tone="info">Enter TAN, pH, temperature and salinity to see the un-ionised ammonia (NH3).</Notice>
  }
  let nh3: number
  let method: keyof typeof NOTES
  try {
    method = ammoniaMethodFor(salinity)
    nh3 = unionizedAmmoniaMgL(tanMgL, pH, tempC, salinity)
  } catch (error) {
    return <Notice tone="watch">NH3 not worked out: {(error as Error).message}.</Notice>
  }
  return (
    <div aria-live="polite" className="flex flex-col gap-2 rounded-lg bg-tide-50 p-3">
      <p className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="font-semibold text-tide-800">Un-ionised ammonia</span>
        <span className="text-xl font-bold tabular-nums text-tide-900" data-testid="nh3">
          {nh3.toFixed(4)} mg/L NH3-N
        </span>
      </p>
      <p className="text-sm text-tide-700">
        = {(nh3 * NH3_PER_N).toFixed(4)} mg/L as NH3 · {AMMONIA_METHOD_NAMES[method]}
      </p>
      <p className="text-sm text-tide-700">{NOTES[method]}</p>
    </div>
  )
}
