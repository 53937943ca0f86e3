import { EntitySchema } from 'typeorm'
import { references } from '../../db/foreign-keys'

export const AUDITED = [
  'routine',
  'playbook',
  'limit',
  'ladder',
  'shift',
  'on_call',
  'assignment',
  'person',
  'completion',
  'event',
  'facility',
  'incident',
] as const
export type AuditedEntity = (typeof AUDITED)[number]

export interface AuditRow {
  id: string
  at: Date
  personId: number | null
  entity: AuditedEntity
  entityId: string
  action: 'create' | 'update' | 'delete' | 'amend'
  before: unknown
  after: unknown
}

/** Who changed what, with before and after. Kept for the retention period; nothing deletes it. */
export const AuditEntity = new EntitySchema<AuditRow>({
  name: 'Audit',
  tableName: 'audit_log',
  columns: {
    id: { type: 'bigint', primary: true, generated: 'increment' },
    at: { type: 'datetime', precision: 3 },
    personId: { type: 'int', nullable: true, foreignKey: references('Person') },
    entity: { type: 'enum', enum: [...AUDITED] },
    entityId: { type: 'varchar', length: 40 },
    action: { type: 'enum', enum: ['create', 'update', 'delete', 'amend'] },
    before: { type: 'json', nullable: true },
    after: { type: 'json', nullable: true },
  },
  indices: [{ columns: ['entity', 'entityId'] }, { columns: ['at'] }],
})
