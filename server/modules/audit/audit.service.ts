import { db } from '../../db/data-source'
import { currentPersonId } from '../../lib/request-context'
import { AuditEntity, type AuditRow, type AuditedEntity } from './audit.entity'

const SECRET_FIELDS = new Set(['passwordHash', 'sessionVersion'])

function clean(value: unknown): unknown {
  if (value === null || value === undefined) return null
  if (typeof value !== 'object') return value
  return Object.fromEntries(Object.entries(value as Record<string, unknown>).filter(([k]) => !SECRET_FIELDS.has(k)))
}

/** Records one change by whoever is acting in this request (or the system, for the scheduler). */
export async function audit(entity: AuditedEntity, entityId: number | string, action: AuditRow['action'], before: unknown, after: unknown) {
  await db().getRepository(AuditEntity).insert({
    at: new Date(), personId: currentPersonId(), entity, entityId: String(entityId), action, before: clean(before) as never, after: clean(after) as never,
  })
}
