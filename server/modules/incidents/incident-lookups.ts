import { db } from '../../db/data-source'
import { IncidentEntity } from './incident.entity'

// What escalation reads of an incident whose alert has no task (one filed by hand); record 13b.
export interface IncidentOwner {
  id: number
  title: string
  /** The ladder's "assignee" step reaches the person who filed it. */
  filedById: number | null
}

export async function incidentOwner(id: number): Promise<IncidentOwner | null> {
  const row = await db()
    .getRepository(IncidentEntity)
    .findOne({ where: { id }, select: { id: true, title: true, filedById: true } })
  return row ? { id: row.id, title: row.title, filedById: row.filedById } : null
}
