import type { Batch } from '#shared/schemas/facility'
import { db } from '../../db/data-source'
import { BatchEntity } from './facility.entities'

/** A batch as other modules read and update it (the batch records), without its entity. */
export const findBatch = (id: number): Promise<Batch | null> => db().getRepository(BatchEntity).findOneBy({ id })

/** A weighing's mean becomes the batch's mean weight, which the rations follow. */
export async function setBatchMeanWeight(batchId: number, meanWeightG: number) {
  await db().getRepository(BatchEntity).update(batchId, { meanWeightG })
}
