import { IsNull } from 'typeorm'
import { bandFor, pickLimit } from '#shared/readings/band'
import { deriveReadings } from '#shared/readings/derive'
import { AmendmentInputSchema } from '#shared/schemas/completion'
import type { Person } from '#shared/schemas/person'
import { MORTALITY_READING } from '#shared/schemas/stock'
import { db } from '../../db/data-source'
import { notFound, validationError } from '../../lib/errors'
import { recordChange } from '../../realtime/change-outbox'
import { audit } from '../audit/audit.service'
import { ParameterEntity } from '../parameters/parameter.entities'
import { adjustRoundMortality } from '../stock/round-mortality'
import { getTaskRow } from '../tasks/tasks.service'
import { AmendmentEntity } from './amendment.entity'
import { CompletionEntity, ReadingEntity } from './completion.entities'
import { readingContextFor } from './reading-context'
import { assertMayCorrect } from './who-may-complete'

/**
 * A correction never overwrites: the amendment keeps its reason and author, the original
 * readings stay in place marked superseded, and the corrected ones are added beside them.
 */
export async function amendCompletion(completionId: string, person: Person, input: unknown) {
  const data = AmendmentInputSchema.parse(input)
  const completion = await db().getRepository(CompletionEntity).findOneBy({ id: completionId })
  if (!completion) throw notFound('That completion')
  assertMayCorrect(completion.personId, person)
  const task = await getTaskRow(completion.taskId)
  const parameters = new Map((await db().getRepository(ParameterEntity).find()).map((p) => [p.key, p]))
  const fieldErrors: Record<string, string[]> = {}
  for (const [key, value] of Object.entries(data.readings)) {
    const p = parameters.get(key)
    if (!p || p.derived) fieldErrors[`readings.${key}`] = ['Not a reading that can be typed in']
    else if (value < p.physicalMin || value > p.physicalMax) fieldErrors[`readings.${key}`] = [`${p.name} ${value} ${p.unit} is impossible`]
  }
  if (Object.keys(fieldErrors).length) throw validationError('Nothing was saved: check the corrected readings.', fieldErrors)

  return db().transaction(async (manager) => {
    const amendment = await manager.getRepository(AmendmentEntity).save({ completionId, personId: person.id, reason: data.reason, readings: data.readings, note: data.note ?? null })
    const readingsRepo = manager.getRepository(ReadingEntity)
    const current = await readingsRepo.find({ where: { completionId, supersededAt: IsNull() } })
    if (Object.keys(data.readings).length) {
      const merged = { ...Object.fromEntries(current.filter((r) => !r.derived).map((r) => [r.parameterKey, r.value])), ...data.readings }
      const context = await readingContextFor(task)
      const derived = deriveReadings(merged, context.salinitySetpoint).values
      const changedKeys = new Set([...Object.keys(data.readings), ...Object.keys(derived)])
      const toSupersede = current.filter((r) => changedKeys.has(r.parameterKey))
      for (const r of toSupersede) await readingsRepo.update(r.id, { supersededAt: new Date() })
      const takenAt = current[0]?.takenAt ?? completion.doneAt
      const rows = [...Object.entries(data.readings).map(([k, v]) => [k, v, false] as const), ...Object.entries(derived).map(([k, v]) => [k, v, true] as const)].map(([key, value, isDerived]) => ({
        completionId, taskId: task.id, tankId: context.tankId, systemId: context.systemId, parameterKey: key, value,
        unit: parameters.get(key)?.unit ?? '', band: bandFor(value, pickLimit(context.limits, key, context)), derived: isDerived,
        takenAt, personId: completion.personId, supersededAt: null, amendmentId: amendment.id,
      }))
      if (rows.length) await readingsRepo.insert(rows)
      await adjustRoundMortality(manager, { completionId, amendmentId: amendment.id, tankId: context.tankId, count: data.readings[MORTALITY_READING], reason: data.reason, personId: person.id, at: new Date() })
    }
    await recordChange('amendment', [completionId])
    await audit('completion', completionId, 'amend', { readings: current.map((r) => ({ key: r.parameterKey, value: r.value })) }, { reason: data.reason, readings: data.readings, note: data.note ?? null })
    return { id: amendment.id, completionId, reason: amendment.reason, readings: amendment.readings, note: amendment.note, createdAt: amendment.createdAt.toISOString(), personName: person.name }
  })
}

/** A completion's full story: the original, every amendment, and all readings (superseded ones marked). */
export async function completionHistory(taskId: number) {
  const completion = await db().getRepository(CompletionEntity).findOneBy({ taskId })
  if (!completion) return null
  const [amendments, readings] = await Promise.all([
    db().getRepository(AmendmentEntity).find({ where: { completionId: completion.id }, order: { id: 'ASC' } }),
    db().getRepository(ReadingEntity).find({ where: { completionId: completion.id }, order: { id: 'ASC' } }),
  ])
  return {
    completion: { id: completion.id, personId: completion.personId, enteredById: completion.enteredById, outcome: completion.outcome, skipReason: completion.skipReason, note: completion.note, doneAt: completion.doneAt.toISOString(), lateMinutes: completion.lateMinutes },
    amendments: amendments.map((a) => ({ id: a.id, personId: a.personId, reason: a.reason, readings: a.readings, note: a.note, createdAt: a.createdAt.toISOString() })),
    readings: readings.map((r) => ({ parameterKey: r.parameterKey, value: r.value, unit: r.unit, band: r.band, derived: r.derived, takenAt: r.takenAt.toISOString(), superseded: r.supersededAt !== null, amendmentId: r.amendmentId })),
  }
}
