import { EntitySchema } from 'typeorm'
import { PRIORITIES, ROUTINE_CATEGORIES, TARGET_KINDS, type Routine } from '#shared/schemas/routine'
import { createdAtColumn, updatedAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface RoutineRow extends Routine {
  createdAt: Date
  updatedAt: Date
}

export const RoutineEntity = new EntitySchema<RoutineRow>({
  name: 'Routine',
  tableName: 'routines',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    name: { type: 'varchar', length: 160 },
    category: { type: 'enum', enum: [...ROUTINE_CATEGORIES] },
    instructions: { type: 'text' },
    targetKind: { type: 'enum', enum: [...TARGET_KINDS] },
    targetIds: { type: 'json' },
    onlyInUse: { type: 'boolean', default: true },
    rrule: { type: 'varchar', length: 500 },
    dtstart: { type: 'varchar', length: 19 },
    durationMinutes: { type: 'int', default: 5 },
    windowBeforeMinutes: { type: 'int', default: 30 },
    graceMinutes: { type: 'int', default: 60 },
    priority: { type: 'enum', enum: [...PRIORITIES], default: 'routine' },
    assigneeRule: { type: 'json' },
    requiredReadings: { type: 'json' },
    activeFrom: { type: 'varchar', length: 10, nullable: true },
    activeTo: { type: 'varchar', length: 10, nullable: true },
    paused: { type: 'boolean', default: false },
    skipDates: { type: 'json' },
    ladderId: { type: 'int', nullable: true, foreignKey: references('Ladder') },
    planningError: { type: 'varchar', length: 500, nullable: true },
    version: { type: 'int', default: 1 },
    createdAt: createdAtColumn,
    updatedAt: updatedAtColumn,
  },
})
