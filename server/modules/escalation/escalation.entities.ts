import { EntitySchema } from 'typeorm'
import { NOTIFICATION_STATUSES, type LadderStep } from '#shared/schemas/ladder'
import { createdAtColumn } from '../../db/timestamps'

export interface LadderRow {
  id: number
  name: string
  steps: LadderStep[]
}

export const LadderEntity = new EntitySchema<LadderRow>({
  name: 'Ladder',
  tableName: 'ladders',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    name: { type: 'varchar', length: 120 },
    steps: { type: 'json' },
  },
})

export interface NotificationRow {
  id: number
  alertId: number
  step: number
  personId: number
  email: string
  subject: string
  status: (typeof NOTIFICATION_STATUSES)[number]
  /** Critical and welfare-critical mail ignores quiet hours. */
  urgent: boolean
  attempts: number
  nextAttemptAt: Date
  lastError: string | null
  sentAt: Date | null
  ackUsedAt: Date | null
  createdAt: Date
}

export const NotificationEntity = new EntitySchema<NotificationRow>({
  name: 'Notification',
  tableName: 'notifications',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    alertId: { type: 'int' },
    step: { type: 'int' },
    personId: { type: 'int' },
    email: { type: 'varchar', length: 200 },
    subject: { type: 'varchar', length: 300 },
    status: { type: 'enum', enum: [...NOTIFICATION_STATUSES], default: 'pending' },
    urgent: { type: 'boolean', default: false },
    attempts: { type: 'int', default: 0 },
    nextAttemptAt: { type: 'datetime', precision: 3 },
    lastError: { type: 'varchar', length: 500, nullable: true },
    sentAt: { type: 'datetime', precision: 3, nullable: true },
    ackUsedAt: { type: 'datetime', precision: 3, nullable: true },
    createdAt: createdAtColumn,
  },
  // One message per alert, step and person, however many processes try.
  indices: [{ columns: ['alertId', 'step', 'personId'], unique: true }, { columns: ['status', 'nextAttemptAt'] }],
})

export interface OutboxRow {
  id: number
  to: string
  subject: string
  text: string
  html: string
  receivedAt: Date
}

/** What the local SMTP server received (local mode), shown on the Outbox page. */
export const OutboxEntity = new EntitySchema<OutboxRow>({
  name: 'OutboxMessage',
  tableName: 'outbox_messages',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    to: { type: 'varchar', length: 500 },
    subject: { type: 'varchar', length: 500 },
    text: { type: 'mediumtext' },
    html: { type: 'mediumtext' },
    receivedAt: { type: 'datetime', precision: 3 },
  },
})

export const DigestEntity = new EntitySchema<{ date: string; sentAt: Date }>({
  name: 'Digest',
  tableName: 'digests',
  columns: {
    date: { type: 'varchar', length: 10, primary: true },
    sentAt: { type: 'datetime', precision: 3 },
  },
})
