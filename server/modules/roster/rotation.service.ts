import { DateTime } from 'luxon'
import { planRotation } from '#shared/roster/rotation'
import type { RotationInput, RotationResult } from '#shared/schemas/roster'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { validationError } from '../../lib/errors'
import { findPeople } from '../people/person-reads'
import { OnCallEntity } from './roster.entities'
import { dutyInstants, listOnCall } from './roster.service'

/**
 * Weekly on-call duties from a Monday for N weeks, handing over each Monday at the facility's
 * handover time, shared so that weekend counts differ by at most one. Existing duties in the
 * period are replaced.
 */
export async function generateRotation(data: RotationInput): Promise<RotationResult> {
  const start = DateTime.fromISO(data.from)
  if (start.weekday !== 1) throw validationError('A rotation starts on a Monday.', { from: ['Choose a Monday'] })
  const people = await findPeople(data.personIds)
  const refused = people.filter((p) => !p.active || !p.onCallEligible)
  if (people.length !== data.personIds.length || refused.length) {
    throw validationError('Everyone in a rotation must be active and eligible for on-call.', {
      personIds: refused.map((p) => `${p.name} cannot hold on-call duty`),
    })
  }
  const plan = planRotation(data.personIds, data.weeks)
  const end = start.plus({ weeks: data.weeks })
  await db().transaction(async (manager) => {
    const repo = manager.getRepository(OnCallEntity)
    await repo.createQueryBuilder().delete().where('fromDate >= :from AND fromDate < :to', { from: data.from, to: end.toISODate() }).execute()
    for (const [week, personId] of plan.entries()) {
      const fromDate = start.plus({ weeks: week }).toISODate()!
      const toDate = start.plus({ weeks: week + 1 }).toISODate()!
      await repo.insert({ personId, fromDate, toDate, ...(await dutyInstants(fromDate, toDate)) })
    }
  })
  const duties = await listOnCall(data.from, end.toISODate()!)
  await audit('on_call', `rotation:${data.from}`, 'create', null, { personIds: data.personIds, weeks: data.weeks, plan })
  const names = new Map(people.map((p) => [p.id, p.name]))
  return {
    duties,
    weekendCounts: data.personIds.map((personId) => ({ personId, personName: names.get(personId)!, weekends: plan.filter((p) => p === personId).length })),
  }
}
