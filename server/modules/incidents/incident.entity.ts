import { EntitySchema } from 'typeorm'
import type { Incident } from '#shared/schemas/incident'
import { INCIDENT_SOURCES, INCIDENT_STATUSES } from '#shared/schemas/incident'
import { references } from '../../db/foreign-keys'

type Dates =
  | 'startedAt'
  | 'noticedAt'
  | 'decidedAt'
  | 'welfareDueAt'
  | 'committeeDueAt'
  | 'reportDueAt'
  | 'welfareNotifiedAt'
  | 'reportedAt'
  | 'closedAt'
  | 'escalatedAt'
  | 'welfareEscalatedAt'
  | 'reportEscalatedAt'
// Names are looked up when answering, never stored.
export type IncidentRow = Omit<Incident, Dates | 'decidedByName' | 'filedByName' | 'people'> & {
  startedAt: Date
  noticedAt: Date
  decidedAt: Date | null
  welfareDueAt: Date
  committeeDueAt: Date
  reportDueAt: Date
  welfareNotifiedAt: Date | null
  reportedAt: Date | null
  closedAt: Date | null
  escalatedAt: Date | null
  welfareEscalatedAt: Date | null
  reportEscalatedAt: Date | null
  /** One proposal per cause (e.g. "missed_task:42"), so a retried clock tick never proposes twice. */
  sourceKey: string | null
  createdAt: Date
}

const when = (nullable = false) => ({ type: 'datetime' as const, precision: 3, nullable })

export const IncidentEntity = new EntitySchema<IncidentRow>({
  name: 'Incident',
  tableName: 'incidents',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    status: { type: 'enum', enum: [...INCIDENT_STATUSES], default: 'proposed' },
    source: { type: 'enum', enum: [...INCIDENT_SOURCES] },
    sourceKey: { type: 'varchar', length: 60, nullable: true, unique: true },
    taskId: { type: 'int', nullable: true, foreignKey: references('Task') },
    title: { type: 'varchar', length: 160 },
    whatHappened: { type: 'text' },
    startedAt: when(),
    noticedAt: when(),
    tankIds: { type: 'json' },
    batchIds: { type: 'json' },
    personIds: { type: 'json' },
    affected: { type: 'int', default: 0 },
    dead: { type: 'int', default: 0 },
    immediateActions: { type: 'text' },
    told: { type: 'json' },
    rootCause: { type: 'text' },
    correctiveActions: { type: 'text' },
    decisionReason: { type: 'varchar', length: 500, nullable: true },
    decidedById: { type: 'int', nullable: true, foreignKey: references('Person') },
    decidedAt: when(true),
    filedById: { type: 'int', nullable: true, foreignKey: references('Person') },
    welfareDueAt: when(),
    committeeDueAt: when(),
    reportDueAt: when(),
    welfareNotifiedAt: when(true),
    reportedAt: when(true),
    closedAt: when(true),
    escalatedAt: when(true),
    welfareEscalatedAt: when(true),
    reportEscalatedAt: when(true),
    notes: { type: 'json' },
    createdAt: { type: 'datetime', precision: 3, createDate: true, default: () => 'CURRENT_TIMESTAMP(3)' },
  },
  indices: [{ columns: ['status', 'committeeDueAt'] }],
})
