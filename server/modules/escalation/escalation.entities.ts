import { EntitySchema } from 'typeorm'
import { CHANNELS, NOTIFICATION_STATUSES, type Channel, type LadderStep } from '#shared/schemas/ladder'
import { createdAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

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
  /** One row per channel: each is claimed, sent and recorded on its own. */
  channel: Channel
  email: string
  /** Where a text or push went (phone number, push endpoint); null for mail (see `email`). */
  destination: string | null
  providerId: string | null
  providerStatus: string | null
  /** The digits a person texts back to acknowledge (text messages only). */
  replyCode: string | null
  subject: string
  status: (typeof NOTIFICATION_STATUSES)[number]
  /** Critical and welfare-critical mail ignores quiet hours. */
  urgent: boolean
  attempts: number
  nextAttemptAt: Date
  /** When a process claimed it for sending (`pending → sending`); a claim far older is a sender that stopped. */
  claimedAt: Date | null
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
    alertId: { type: 'int', foreignKey: references('Alert') },
    step: { type: 'int' },
    personId: { type: 'int', foreignKey: references('Person') },
    channel: { type: 'enum', enum: [...CHANNELS], default: 'email' },
    email: { type: 'varchar', length: 200 },
    destination: { type: 'varchar', length: 1000, nullable: true },
    providerId: { type: 'varchar', length: 64, nullable: true },
    providerStatus: { type: 'varchar', length: 40, nullable: true },
    replyCode: { type: 'varchar', length: 8, nullable: true },
    subject: { type: 'varchar', length: 300 },
    status: { type: 'enum', enum: [...NOTIFICATION_STATUSES], default: 'pending' },
    urgent: { type: 'boolean', default: false },
    attempts: { type: 'int', default: 0 },
    nextAttemptAt: { type: 'datetime', precision: 3 },
    claimedAt: { type: 'datetime', precision: 3, nullable: true },
    lastError: { type: 'varchar', length: 500, nullable: true },
    sentAt: { type: 'datetime', precision: 3, nullable: true },
    ackUsedAt: { type: 'datetime', precision: 3, nullable: true },
    createdAt: createdAtColumn,
  },
  // One message per alert, step, person and channel, however many processes try.
  indices: [
    { name: 'IDX_notifications_alert_step_person_channel', columns: ['alertId', 'step', 'personId', 'channel'], unique: true },
    { columns: ['status', 'nextAttemptAt'] },
    { name: 'IDX_notifications_provider', columns: ['providerId'] },
  ],
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

export interface TextOutboxRow {
  id: number
  sid: string
  direction: 'outbound' | 'inbound'
  to: string
  from: string
  body: string
  status: string
  statusCallback: string | null
  receivedAt: Date
}

/** What the local text provider received or delivered inbound (local mode), for the Outbox page. */
export const TextOutboxEntity = new EntitySchema<TextOutboxRow>({
  name: 'TextOutboxMessage',
  tableName: 'text_outbox',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    sid: { type: 'varchar', length: 40, unique: true },
    direction: { type: 'enum', enum: ['outbound', 'inbound'] },
    to: { type: 'varchar', length: 40 },
    from: { type: 'varchar', length: 40 },
    body: { type: 'text' },
    status: { type: 'varchar', length: 20 },
    statusCallback: { type: 'varchar', length: 500, nullable: true },
    receivedAt: { type: 'datetime', precision: 3 },
  },
})

export interface PushOutboxRow {
  id: number
  endpoint: string
  /** `received`: VAPID checked and the body decrypted; `refused`: the stand-in turned it away (see `note`). */
  status: 'received' | 'refused'
  title: string
  body: string
  note: string | null
  urgency: string | null
  receivedAt: Date
}

/** What the local push service decrypted or refused (local mode), for the Outbox page. */
export const PushOutboxEntity = new EntitySchema<PushOutboxRow>({
  name: 'PushOutboxMessage',
  tableName: 'push_outbox',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    endpoint: { type: 'varchar', length: 1000 },
    status: { type: 'enum', enum: ['received', 'refused'] },
    title: { type: 'varchar', length: 300 },
    body: { type: 'text' },
    note: { type: 'varchar', length: 300, nullable: true },
    urgency: { type: 'varchar', length: 20, nullable: true },
    receivedAt: { type: 'datetime', precision: 3 },
  },
})

export interface TextQuotaRow {
  personId: number
  hourStart: Date
  used: number
  suppressed: number
  summaryStatus: 'none' | 'sending' | 'sent' | 'failed'
  summaryProviderId: string | null
}

/** Texts sent to a person in one clock hour: the slot is taken by a conditional update, so the limit holds across processes. */
export const TextQuotaEntity = new EntitySchema<TextQuotaRow>({
  name: 'TextQuota',
  tableName: 'text_quotas',
  columns: {
    personId: { type: 'int', primary: true, foreignKey: references('Person') },
    hourStart: { type: 'datetime', precision: 0, primary: true },
    used: { type: 'int', default: 0 },
    suppressed: { type: 'int', default: 0 },
    summaryStatus: { type: 'enum', enum: ['none', 'sending', 'sent', 'failed'], default: 'none' },
    summaryProviderId: { type: 'varchar', length: 64, nullable: true },
  },
})
