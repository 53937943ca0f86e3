import { EntitySchema } from 'typeorm'
import { references } from '../../db/foreign-keys'

export interface PushSubscriptionRow {
  id: number
  personId: number
  /** SHA-256 of the endpoint: the unique key, since an endpoint URL is too long to index whole. */
  endpointHash: string
  endpoint: string
  p256dh: string
  auth: string
  createdAt: Date
}

/** One device that accepts push alerts for a person (a browser's PushSubscription). */
export const PushSubscriptionEntity = new EntitySchema<PushSubscriptionRow>({
  name: 'PushSubscription',
  tableName: 'push_subscriptions',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    personId: { type: 'int', foreignKey: references('Person') },
    endpointHash: { type: 'char', length: 64 },
    endpoint: { type: 'varchar', length: 1000 },
    p256dh: { type: 'varchar', length: 200 },
    auth: { type: 'varchar', length: 100 },
    createdAt: { type: 'datetime', precision: 3 },
  },
  indices: [
    { name: 'IDX_push_subscriptions_endpoint', columns: ['endpointHash'], unique: true },
    { name: 'IDX_push_subscriptions_person', columns: ['personId'] },
  ],
})
