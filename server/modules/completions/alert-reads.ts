import { IsNull } from 'typeorm'
import { db } from '../../db/data-source'
import { AlertEntity } from './completion.entities'

/** Alerts nobody has acknowledged or closed yet, latest first (the on-call summary). */
export const openUnacknowledgedAlerts = (limit: number) =>
  db().getRepository(AlertEntity).find({ where: { closedAt: IsNull(), acknowledgedAt: IsNull() }, order: { startedAt: 'DESC' }, take: limit })
