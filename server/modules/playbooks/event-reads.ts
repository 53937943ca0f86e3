import { Not } from 'typeorm'
import { db } from '../../db/data-source'
import { EventEntity } from './playbook.entities'

/** Events that still stand (planned or ended, not cancelled), for the calendar. */
export const eventsNotCancelled = () => db().getRepository(EventEntity).find({ where: { status: Not('cancelled') } })
