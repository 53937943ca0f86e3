import { compareWater } from '#shared/arrival/compare-water'
import type { BatchRecord, ParsedBatchRecordInput } from '#shared/schemas/batch-record'
import type { Person } from '#shared/schemas/person'
import { describeSample } from '#shared/stats/sample-stats'
import { unionizedAmmoniaMgL } from '#shared/water/ammonia'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import { findBatch, setBatchMeanWeight } from '../facility/batches.service'
import { getFacility } from '../facility/facility.service'
import { loadTaskContext } from '../tasks/tasks.service'
import { BatchRecordEntity } from './playbook.entities'

/**
 * Adds to a batch's record. The server works out what the form showed (box-versus-receiving
 * warnings, NH3 of the transport water, the weighing's statistics) so the record holds it,
 * and a weighing updates the batch's mean weight, which the rations follow.
 */
export async function addBatchRecord(batchId: number, person: Person, { eventId, ...data }: ParsedBatchRecordInput): Promise<BatchRecord> {
  const batch = await findBatch(batchId)
  if (!batch) throw notFound('That batch')
  let stored: Record<string, unknown> = { ...data }
  if (data.kind === 'transport_box') {
    const facility = await getFacility()
    stored = {
      ...data,
      ...compareWater(
        { tempC: data.tempC, pH: data.pH, doMgL: data.doMgL },
        { tempC: data.receivingTempC, pH: data.receivingPH },
        facility.arrivalTempDiffLimitC,
      ),
    }
  }
  if (data.kind === 'transport_water') {
    let nh3: number | null
    try {
      nh3 = unionizedAmmoniaMgL(data.tanMgL, data.pH, data.tempC, data.salinity)
    } catch {
      // Outside the method's valid range: the record keeps the inputs without a computed NH3.
      nh3 = null
    }
    stored = { ...data, nh3MgL: nh3 === null ? null : Math.round(nh3 * 10000) / 10000 }
  }
  if (data.kind === 'weighing') {
    const stats = describeSample(data.weightsG)
    stored = { ...data, ...stats }
    if (data.updateBatchMean) await setBatchMeanWeight(batchId, Math.round(stats.mean * 100) / 100)
  }
  const row = await db().getRepository(BatchRecordEntity).save({ batchId, eventId, kind: data.kind, data: stored, personId: person.id })
  return { id: row.id, batchId, eventId, kind: row.kind, data: stored, personName: person.name, createdAt: row.createdAt.toISOString() }
}

export async function listBatchRecords(batchId: number): Promise<BatchRecord[]> {
  const rows = await db()
    .getRepository(BatchRecordEntity)
    .find({ where: { batchId }, order: { createdAt: 'ASC' } })
  const ctx = await loadTaskContext()
  return rows.map((r) => ({
    id: r.id,
    batchId: r.batchId,
    eventId: r.eventId,
    kind: r.kind,
    data: r.data,
    personName: ctx.names.get(r.personId) ?? 'Unknown',
    createdAt: r.createdAt.toISOString(),
  }))
}
