import { EntitySchema } from 'typeorm'
import { EVENT_KINDS, EVENT_STATUSES, type EventKind, type PlaybookStep } from '#shared/schemas/playbook'
import { createdAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface PlaybookRow {
  id: number
  name: string
  kind: EventKind
  description: string
  fastingHours: number
  steps: PlaybookStep[]
}

export const PlaybookEntity = new EntitySchema<PlaybookRow>({
  name: 'Playbook',
  tableName: 'playbooks',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    name: { type: 'varchar', length: 160 },
    kind: { type: 'enum', enum: [...EVENT_KINDS] },
    description: { type: 'text' },
    fastingHours: { type: 'int', default: 0 },
    steps: { type: 'json' },
  },
})

export interface EventRow {
  id: number
  playbookId: number
  kind: EventKind
  title: string
  localStart: string
  startsAt: Date
  tankIds: number[]
  batchId: number | null
  notes: string
  status: (typeof EVENT_STATUSES)[number]
  fastingFrom: Date | null
  fastingTo: Date | null
  createdById: number
  version: number
}

export const EventEntity = new EntitySchema<EventRow>({
  name: 'FacilityEvent',
  tableName: 'events',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    playbookId: { type: 'int', foreignKey: references('Playbook') },
    kind: { type: 'enum', enum: [...EVENT_KINDS] },
    title: { type: 'varchar', length: 160 },
    localStart: { type: 'varchar', length: 19 },
    startsAt: { type: 'datetime', precision: 3 },
    tankIds: { type: 'json' },
    batchId: { type: 'int', nullable: true, foreignKey: references('Batch') },
    notes: { type: 'text' },
    status: { type: 'enum', enum: [...EVENT_STATUSES], default: 'planned' },
    fastingFrom: { type: 'datetime', precision: 3, nullable: true },
    fastingTo: { type: 'datetime', precision: 3, nullable: true },
    createdById: { type: 'int', foreignKey: references('Person') },
    version: { type: 'int', default: 1 },
  },
  indices: [{ columns: ['startsAt'] }],
})

export const BATCH_RECORD_KINDS = ['transport_box', 'transport_water', 'weighing', 'bath', 'note', 'review'] as const
export interface BatchRecordRow {
  id: number
  batchId: number
  eventId: number | null
  kind: (typeof BATCH_RECORD_KINDS)[number]
  data: Record<string, unknown>
  personId: number
  createdAt: Date
}

/** What an arrival or handling leaves on the batch's record: box checks, water tests, weighings, baths. */
export const BatchRecordEntity = new EntitySchema<BatchRecordRow>({
  name: 'BatchRecord',
  tableName: 'batch_records',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    batchId: { type: 'int', foreignKey: references('Batch') },
    eventId: { type: 'int', nullable: true, foreignKey: references('FacilityEvent') },
    kind: { type: 'enum', enum: [...BATCH_RECORD_KINDS] },
    data: { type: 'json' },
    personId: { type: 'int', foreignKey: references('Person') },
    createdAt: createdAtColumn,
  },
  indices: [{ columns: ['batchId'] }],
})
