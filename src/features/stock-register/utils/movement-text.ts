import { OTHER_CAUSE, UNKNOWN_CAUSE, type Movement } from '#shared/schemas/stock'

/** Which register the ledger is read from: a transfer is in on one tank's page, out on another's. */
export type LedgerView = { tankId: number } | { batchId: number }

/** Where the fish went, in tank codes. */
export function movementPlaces(m: Movement): string {
  if (m.kind === 'correction') return m.toTankCode ? `in ${m.toTankCode}` : ''
  if (m.fromTankCode && m.toTankCode) return `${m.fromTankCode} → ${m.toTankCode}`
  if (m.toTankCode) return `into ${m.toTankCode}`
  if (m.fromTankCode) return `out of ${m.fromTankCode}`
  return ''
}

/** The change in the count this view shows: signed for a tank, zero for a move inside the batch. */
export function countChange(m: Movement, view: LedgerView): number {
  if (m.kind === 'correction') return m.count
  const tankId = 'tankId' in view ? view.tankId : null
  if (tankId === null) return m.fromTankId && m.toTankId ? 0 : m.toTankId ? m.count : -m.count
  return (m.toTankId === tankId ? m.count : 0) - (m.fromTankId === tankId ? m.count : 0)
}

export const signed = (n: number) => (n > 0 ? `+${n.toLocaleString('en-GB')}` : n < 0 ? `−${Math.abs(n).toLocaleString('en-GB')}` : '±0')

export function causeText(m: Pick<Movement, 'cause' | 'causeText'>): string | null {
  if (!m.cause) return null
  if (m.cause === UNKNOWN_CAUSE) return 'Cause unknown'
  if (m.cause === OTHER_CAUSE) return `Cause: ${m.causeText ?? 'other'}`
  return `Cause: ${m.cause}${m.causeText ? ` (${m.causeText})` : ''}`
}

/** The facts a committee asks about, one short phrase each. */
export function movementFacts(m: Movement): string[] {
  const water = m.transportWater
  const waterText =
    water &&
    [water.tempC !== null && `${water.tempC} °C`, water.pH !== null && `pH ${water.pH}`, water.doMgL !== null && `DO ${water.doMgL} mg/L`]
      .filter(Boolean)
      .join(', ')
  return [
    m.meanWeightG !== null && `mean ${m.meanWeightG} g`,
    m.origin && `from ${m.origin}`,
    m.permitRef && `permit ${m.permitRef}`,
    m.healthCertificateRef && `health certificate ${m.healthCertificateRef}`,
    waterText && `transport water ${waterText}`,
    causeText(m),
    m.necropsy && 'kept for necropsy',
    m.destination && `to ${m.destination}`,
    m.reason,
    m.completionId && 'from the round',
    m.note,
  ].filter((f): f is string => typeof f === 'string' && f.length > 0)
}
