import type { ChangeKind } from '#shared/schemas/live'
import { insertRows } from '../../db/prepared'
import { currentPersonId } from '../../lib/request-context'
import { recordChange } from '../../realtime/change-outbox'
import { AuditEntity, type AuditRow, type AuditedEntity } from './audit.entity'

const SECRET_FIELDS = new Set(['passwordHash', 'sessionVersion'])

/** What an audited change tells the live feed; null where the caller records it itself (tasks, amendments) or nobody shows it live. */
const LIVE_KIND: Record<AuditedEntity, ChangeKind | null> = {
  routine: 'routine',
  playbook: 'playbook',
  limit: 'parameter',
  ladder: null,
  shift: 'roster',
  on_call: 'roster',
  assignment: null,
  person: null,
  completion: null,
  event: 'event',
  facility: 'facility',
  incident: 'incident',
}

function clean(value: unknown): unknown {
  if (value === null || value === undefined) return null
  if (typeof value !== 'object') return value
  return Object.fromEntries(Object.entries(value as Record<string, unknown>).filter(([k]) => !SECRET_FIELDS.has(k)))
}

/**
 * Records one change by whoever is acting in this request (or the system, for the scheduler),
 * and the outbox row that tells the live feed, both in the caller's transaction.
 */
export async function audit(entity: AuditedEntity, entityId: number | string, action: AuditRow['action'], before: unknown, after: unknown) {
  await insertRows(AuditEntity, [
    {
      at: new Date(),
      personId: currentPersonId(),
      entity,
      entityId: String(entityId),
      action,
      before: clean(before) as never,
      after: clean(after) as never,
    },
  ])
  const kind = LIVE_KIND[entity]
  if (kind) await recordChange(kind, [entityId])
}
