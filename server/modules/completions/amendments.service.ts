import { IsNull } from 'typeorm'
import { judgeReadings } from '#shared/readings/judge-readings'
import type { ParsedAmendmentInput } from '#shared/schemas/completion'
import type { Person } from '#shared/schemas/person'
import { MORTALITY_READING } from '#shared/schemas/stock'
import { db } from '../../db/data-source'
import { notFound, validationError } from '../../lib/errors'
import { recordChange } from '../../realtime/change-outbox'
import { audit } from '../audit/audit.service'
import { adjustRoundMortality } from '../stock/round-mortality'
import { getTaskRow } from '../tasks/tasks.service'
import { reflagAfterAmendment } from './amendment-rejudge'
import { AmendmentEntity } from './amendment.entity'
import { CompletionEntity, ReadingEntity } from './completion.entities'
import { readingContextFor } from './reading-context'
import { assertMayCorrect } from './who-may-complete'

/**
 * A correction never overwrites: the amendment keeps its reason and author, the original
 * readings stay in place marked superseded, and the corrected ones are added beside them. The
 * corrected record is judged again as a whole, by the same judgement as a completion.
 */
export async function amendCompletion(completionId: string, person: Person, data: ParsedAmendmentInput) {
  const completion = await db().getRepository(CompletionEntity).findOneBy({ id: completionId })
  if (!completion) throw notFound('That completion')
  assertMayCorrect(completion.personId, person)
  const task = await getTaskRow(completion.taskId)
  const context = await readingContextFor(task)
  const problems = Object.entries(judgeReadings(data.readings, context.ruleFor).problems)
  if (problems.length)
    throw validationError('Nothing was saved: check the corrected readings.', Object.fromEntries(problems.map(([key, p]) => [`readings.${key}`, [p.message]])))

  return db().transaction(async (manager) => {
    const amendment = await manager
      .getRepository(AmendmentEntity)
      .save({ completionId, personId: person.id, reason: data.reason, readings: data.readings, note: data.note ?? null })
    const readingsRepo = manager.getRepository(ReadingEntity)
    const current = await readingsRepo.find({ where: { completionId, supersededAt: IsNull() } })
    let flag = task.flag
    if (Object.keys(data.readings).length) {
      const merged = { ...Object.fromEntries(current.filter((r) => !r.derived).map((r) => [r.parameterKey, r.value])), ...data.readings }
      const judged = judgeReadings(merged, context.ruleFor, { salinitySetpoint: context.salinitySetpoint })
      const derivedKeys = judged.readings.filter((r) => r.derived).map((r) => r.parameterKey)
      const changedKeys = new Set([...Object.keys(data.readings), ...derivedKeys])
      for (const r of current.filter((c) => changedKeys.has(c.parameterKey))) await readingsRepo.update(r.id, { supersededAt: new Date() })
      const takenAt = current[0]?.takenAt ?? completion.doneAt
      const rows = judged.readings
        .filter((r) => changedKeys.has(r.parameterKey))
        .map((r) => ({
          ...r,
          completionId,
          taskId: task.id,
          tankId: context.tankId,
          systemId: context.systemId,
          takenAt,
          personId: completion.personId,
          supersededAt: null,
          amendmentId: amendment.id,
        }))
      if (rows.length) await readingsRepo.insert(rows)
      await adjustRoundMortality(manager, {
        completionId,
        amendmentId: amendment.id,
        tankId: context.tankId,
        count: data.readings[MORTALITY_READING],
        reason: data.reason,
        personId: person.id,
        at: new Date(),
      })
      flag = await reflagAfterAmendment(task, completion, judged, new Date())
    }
    await recordChange('amendment', [completionId])
    const before = { readings: current.map((r) => ({ key: r.parameterKey, value: r.value })), flag: task.flag }
    await audit('completion', completionId, 'amend', before, { reason: data.reason, readings: data.readings, note: data.note ?? null, flag })
    return {
      id: amendment.id,
      completionId,
      reason: amendment.reason,
      readings: amendment.readings,
      note: amendment.note,
      createdAt: amendment.createdAt.toISOString(),
      personName: person.name,
    }
  })
}

/** A completion's full story: the original, every amendment, and all readings (superseded ones marked). */
export async function completionHistory(taskId: number) {
  const completion = await db().getRepository(CompletionEntity).findOneBy({ taskId })
  if (!completion) return null
  const [amendments, readings] = await Promise.all([
    db()
      .getRepository(AmendmentEntity)
      .find({ where: { completionId: completion.id }, order: { id: 'ASC' } }),
    db()
      .getRepository(ReadingEntity)
      .find({ where: { completionId: completion.id }, order: { id: 'ASC' } }),
  ])
  return {
    completion: {
      id: completion.id,
      personId: completion.personId,
      enteredById: completion.enteredById,
      outcome: completion.outcome,
      skipReason: completion.skipReason,
      note: completion.note,
      doneAt: completion.doneAt.toISOString(),
      lateMinutes: completion.lateMinutes,
    },
    amendments: amendments.map((a) => ({
      id: a.id,
      personId: a.personId,
      reason: a.reason,
      readings: a.readings,
      note: a.note,
      createdAt: a.createdAt.toISOString(),
    })),
    readings: readings.map((r) => ({
      parameterKey: r.parameterKey,
      value: r.value,
      unit: r.unit,
      band: r.band,
      derived: r.derived,
      takenAt: r.takenAt.toISOString(),
      superseded: r.supersededAt !== null,
      amendmentId: r.amendmentId,
    })),
  }
}
