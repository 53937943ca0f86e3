import { EntitySchema } from 'typeorm'
import { createdAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface AmendmentRow {
  id: number
  completionId: string
  personId: number
  reason: string
  /** The corrected values; the original readings stay, marked superseded. */
  readings: Record<string, number>
  note: string | null
  createdAt: Date
}

export const AmendmentEntity = new EntitySchema<AmendmentRow>({
  name: 'Amendment',
  tableName: 'completion_amendments',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    completionId: { type: 'varchar', length: 36, foreignKey: references('Completion') },
    personId: { type: 'int', foreignKey: references('Person') },
    reason: { type: 'varchar', length: 1000 },
    readings: { type: 'json' },
    note: { type: 'text', nullable: true },
    createdAt: createdAtColumn,
  },
  indices: [{ columns: ['completionId'] }],
})
