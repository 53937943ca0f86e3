import { EntitySchema } from 'typeorm'
import { CHANGE_KINDS, type ChangeKind } from '#shared/schemas/live'

export interface ChangeRow {
  id: string
  kind: ChangeKind
  /** The changed record's id; for `tasks` the reason many changed at once. */
  entityId: string | null
  createdAt: Date
  /** The publisher run that took this row to send (record 13c). */
  claimedBy: string | null
  claimedAt: Date | null
  publishedAt: Date | null
}

/** Changes waiting to be told to the live feed; written in the same commit as the change itself. */
export const ChangeOutboxEntity = new EntitySchema<ChangeRow>({
  name: 'ChangeOutbox',
  tableName: 'change_outbox',
  columns: {
    id: { type: 'bigint', primary: true, generated: 'increment' },
    kind: { type: 'enum', enum: [...CHANGE_KINDS] },
    entityId: { type: 'varchar', length: 64, nullable: true },
    createdAt: { type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' },
    claimedBy: { type: 'varchar', length: 64, nullable: true },
    claimedAt: { type: 'datetime', precision: 3, nullable: true },
    publishedAt: { type: 'datetime', precision: 3, nullable: true },
  },
  indices: [{ columns: ['publishedAt', 'id'] }],
})
