import type { EntityManager } from 'typeorm'
import { BatchEntity } from './facility.entities'

/**
 * The stock register owns a batch's numbers: after each movement it writes the batch's fish on
 * hand and the tanks that hold them here, so rations and limits per batch follow the register.
 */
export async function updateBatchFromRegister(manager: EntityManager, batchId: number, count: number, tankIds: number[]) {
  await manager.getRepository(BatchEntity).update(batchId, { count, tankIds })
}
