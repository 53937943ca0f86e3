import { randomUUID } from 'node:crypto'
import { batches } from '#server/modules/facility/catalogues'
import type { Tank } from '#shared/schemas/facility'
import { MovementInputSchema } from '#shared/schemas/stock'

/** A batch listed in the catalogue but not yet on the register (its arrival is recorded by the test). */
export async function makeBatch(tankIds: number[] = [], extra: { meanWeightG?: number } = {}) {
  return batches.create({
    code: `B-${randomUUID().slice(0, 8)}`,
    species: 'Lates calcarifer',
    origin: 'Invented hatchery',
    arrivalDate: '2026-01-05',
    count: 0,
    meanWeightG: extra.meanWeightG ?? 50,
    tankIds,
    status: 'active',
    feedRatePct: null,
  })
}

export const arrival = (batchId: number, tank: Pick<Tank, 'id'>, count: number, extra: Record<string, unknown> = {}) => ({
  kind: 'arrival',
  batchId,
  toTankId: tank.id,
  count,
  origin: 'Invented hatchery',
  permitRef: 'PERMIT-0001',
  healthCertificateRef: 'HC-0001',
  ...extra,
})

/** The same, parsed as the route parses it, for tests that call the stock service directly. */
export const parsedArrival = (...args: Parameters<typeof arrival>) => MovementInputSchema.parse(arrival(...args))
