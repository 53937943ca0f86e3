import { EntitySchema } from 'typeorm'
import { BANDS, type Band } from '#shared/schemas/parameter'
import { PRIORITIES, ROUTINE_CATEGORIES, TARGET_KINDS, type Category, type TargetKind } from '#shared/schemas/routine'
import { TASK_STATUSES, type TaskStatus } from '#shared/schemas/task'
import { createdAtColumn, updatedAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface TaskRow {
  id: number
  routineId: number | null
  eventId: number | null
  title: string
  category: Category
  instructions: string
  priority: (typeof PRIORITIES)[number]
  targetKind: TargetKind
  /** 0 when the target is the facility itself, so the unique key below holds. */
  targetId: number
  tankId: number | null
  areaId: number | null
  localDate: string
  localStart: string
  /** The routine occurrence this task stands for; unchanged when the task is moved to another day. */
  occurrenceStart: string
  dueAt: Date
  windowStartAt: Date
  graceUntil: Date
  durationMinutes: number
  status: TaskStatus
  assigneeId: number | null
  /** Set by a supervisor's drag or a person taking the task; re-materialising keeps it. */
  assignedManually: boolean
  edited: boolean
  requiredReadings: string[]
  flag: Band | null
  lateMinutes: number | null
  completedAt: Date | null
  completedById: number | null
  heldReason: string | null
  recheckOfTaskId: number | null
  version: number
  createdAt: Date
  updatedAt: Date
}

export const TaskEntity = new EntitySchema<TaskRow>({
  name: 'Task',
  tableName: 'tasks',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    routineId: { type: 'int', nullable: true, foreignKey: references('Routine', 'SET NULL') },
    eventId: { type: 'int', nullable: true, foreignKey: references('FacilityEvent') },
    title: { type: 'varchar', length: 160 },
    category: { type: 'enum', enum: [...ROUTINE_CATEGORIES] },
    instructions: { type: 'text' },
    priority: { type: 'enum', enum: [...PRIORITIES], default: 'routine' },
    targetKind: { type: 'enum', enum: [...TARGET_KINDS] },
    targetId: { type: 'int', default: 0 },
    tankId: { type: 'int', nullable: true, foreignKey: references('Tank') },
    areaId: { type: 'int', nullable: true, foreignKey: references('Area') },
    localDate: { type: 'varchar', length: 10 },
    localStart: { type: 'varchar', length: 19 },
    occurrenceStart: { type: 'varchar', length: 19 },
    dueAt: { type: 'datetime', precision: 3 },
    windowStartAt: { type: 'datetime', precision: 3 },
    graceUntil: { type: 'datetime', precision: 3 },
    durationMinutes: { type: 'int' },
    status: { type: 'enum', enum: [...TASK_STATUSES], default: 'planned' },
    assigneeId: { type: 'int', nullable: true, foreignKey: references('Person') },
    assignedManually: { type: 'boolean', default: false },
    edited: { type: 'boolean', default: false },
    requiredReadings: { type: 'json' },
    flag: { type: 'enum', enum: [...BANDS], nullable: true },
    lateMinutes: { type: 'int', nullable: true },
    completedAt: { type: 'datetime', precision: 3, nullable: true },
    completedById: { type: 'int', nullable: true, foreignKey: references('Person') },
    heldReason: { type: 'varchar', length: 300, nullable: true },
    recheckOfTaskId: { type: 'int', nullable: true, foreignKey: references('Task') },
    version: { type: 'int', default: 1 },
    createdAt: createdAtColumn,
    updatedAt: updatedAtColumn,
  },
  indices: [
    { name: 'uq_task_occurrence', columns: ['routineId', 'targetKind', 'targetId', 'occurrenceStart'], unique: true },
    { columns: ['localDate', 'status'] },
    { columns: ['assigneeId', 'localDate'] },
    { columns: ['tankId', 'localDate'] },
    { columns: ['status', 'dueAt'] },
  ],
})
