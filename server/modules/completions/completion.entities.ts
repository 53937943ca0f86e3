import { EntitySchema } from 'typeorm'
import { BANDS, type Band } from '#shared/schemas/parameter'
import { createdAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface CompletionRow {
  id: string
  taskId: number
  personId: number
  outcome: 'done' | 'skipped'
  skipReason: string | null
  note: string | null
  doneAt: Date
  lateMinutes: number | null
  /** Who typed it in, when not the person who did the work (a paper sheet entered later). */
  enteredById: number | null
  /** The first answer, returned again to a replay of the same completion id. */
  response: unknown
  createdAt: Date
}

export const CompletionEntity = new EntitySchema<CompletionRow>({
  name: 'Completion',
  tableName: 'completions',
  columns: {
    id: { type: 'varchar', length: 36, primary: true },
    taskId: { type: 'int', foreignKey: references('Task') },
    personId: { type: 'int', foreignKey: references('Person') },
    outcome: { type: 'enum', enum: ['done', 'skipped'] },
    skipReason: { type: 'varchar', length: 40, nullable: true },
    note: { type: 'text', nullable: true },
    doneAt: { type: 'datetime', precision: 3 },
    lateMinutes: { type: 'int', nullable: true },
    enteredById: { type: 'int', nullable: true, foreignKey: references('Person') },
    response: { type: 'json', nullable: true },
    createdAt: createdAtColumn,
  },
  indices: [{ columns: ['taskId'] }],
})

export interface ReadingRow {
  id: string
  completionId: string
  taskId: number
  tankId: number | null
  systemId: number | null
  parameterKey: string
  value: number
  unit: string
  band: Band
  derived: boolean
  takenAt: Date
  personId: number
  /** Set on a reading an amendment corrected; the amendment's own readings carry its id. */
  supersededAt: Date | null
  amendmentId: number | null
}

export const ReadingEntity = new EntitySchema<ReadingRow>({
  name: 'Reading',
  tableName: 'readings',
  columns: {
    id: { type: 'bigint', primary: true, generated: 'increment' },
    completionId: { type: 'varchar', length: 36, foreignKey: references('Completion') },
    taskId: { type: 'int', foreignKey: references('Task') },
    tankId: { type: 'int', nullable: true, foreignKey: references('Tank') },
    systemId: { type: 'int', nullable: true, foreignKey: references('System') },
    parameterKey: { type: 'varchar', length: 40 },
    value: { type: 'double' },
    unit: { type: 'varchar', length: 40 },
    band: { type: 'enum', enum: [...BANDS] },
    derived: { type: 'boolean', default: false },
    takenAt: { type: 'datetime', precision: 3 },
    personId: { type: 'int', foreignKey: references('Person') },
    supersededAt: { type: 'datetime', precision: 3, nullable: true },
    amendmentId: { type: 'int', nullable: true, foreignKey: references('Amendment') },
  },
  indices: [{ columns: ['tankId', 'parameterKey', 'takenAt'] }, { columns: ['systemId', 'parameterKey', 'takenAt'] }, { columns: ['completionId'] }],
})

export const ALERT_KINDS = ['critical_reading', 'missed_task', 'incident_overdue', 'incident_welfare_overdue', 'incident_report_overdue'] as const
export interface AlertRow {
  id: number
  /** The task whose ladder it climbs; null for an incident filed by hand, which has no task. */
  taskId: number | null
  /** The incident whose deadline passed (incident alerts only). */
  incidentId: number | null
  kind: (typeof ALERT_KINDS)[number]
  detail: string
  ladderId: number | null
  startedAt: Date
  acknowledgedAt: Date | null
  acknowledgedById: number | null
  closedAt: Date | null
}

/** An escalation that has started: a critical reading or a missed task; the ladder works from here. */
export const AlertEntity = new EntitySchema<AlertRow>({
  name: 'Alert',
  tableName: 'alerts',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    taskId: { type: 'int', nullable: true, foreignKey: references('Task') },
    incidentId: { type: 'int', nullable: true, foreignKey: references('Incident') },
    kind: { type: 'enum', enum: [...ALERT_KINDS] },
    detail: { type: 'varchar', length: 500 },
    ladderId: { type: 'int', nullable: true, foreignKey: references('Ladder') },
    startedAt: { type: 'datetime', precision: 3 },
    acknowledgedAt: { type: 'datetime', precision: 3, nullable: true },
    acknowledgedById: { type: 'int', nullable: true, foreignKey: references('Person') },
    closedAt: { type: 'datetime', precision: 3, nullable: true },
  },
  indices: [
    { columns: ['taskId', 'kind'], unique: true },
    { name: 'IDX_alerts_incident_kind', columns: ['incidentId', 'kind'], unique: true },
    { columns: ['closedAt'] },
  ],
})

export interface PhotoRow {
  id: string
  taskId: number
  personId: number
  fileName: string
  mimeType: string
  sizeBytes: number
  createdAt: Date
}

/** Photos live on disk under the upload folder; the database keeps only where and whose. */
export const PhotoEntity = new EntitySchema<PhotoRow>({
  name: 'Photo',
  tableName: 'photos',
  columns: {
    id: { type: 'varchar', length: 36, primary: true },
    taskId: { type: 'int', foreignKey: references('Task') },
    personId: { type: 'int', foreignKey: references('Person') },
    fileName: { type: 'varchar', length: 80 },
    mimeType: { type: 'varchar', length: 40 },
    sizeBytes: { type: 'int' },
    createdAt: createdAtColumn,
  },
  indices: [{ columns: ['taskId'] }],
})
