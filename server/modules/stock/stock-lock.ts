import type { EntityManager } from 'typeorm'
import { balances, type LedgerEntry } from '#shared/stock/ledger'
import { MovementEntity, type MovementRow } from './stock.entities'

export const toEntry = (m: MovementRow): LedgerEntry => ({
  id: m.id,
  batchId: m.batchId,
  kind: m.kind,
  fromTankId: m.fromTankId,
  toTankId: m.toTankId,
  count: m.count,
  cause: m.cause,
  correctsId: m.correctsId,
})

/**
 * Reads a batch's register with its rows locked, so two movements of the same batch are
 * checked against the count one after the other and neither can take it below zero.
 */
export async function lockBatchRegister(manager: EntityManager, batchId: number) {
  const rows = await manager
    .getRepository(MovementEntity)
    .createQueryBuilder('m')
    .where('m.batchId = :batchId', { batchId })
    .orderBy('m.id', 'ASC')
    .setLock('pessimistic_write')
    .getMany()
  return { rows, onHand: balances(rows.map(toEntry)) }
}
