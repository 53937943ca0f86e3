import type { AuditRow } from '#shared/schemas/report'
import { db } from '../../db/data-source'
import { AuditEntity } from './audit.entity'

/** The latest 1,000 changes between two UTC days (both whole), of one kind or all, newest first. */
export async function auditTrail(from: string, to: string, entity?: string): Promise<AuditRow[]> {
  const qb = db()
    .getRepository(AuditEntity)
    .createQueryBuilder('a')
    .where('a.at BETWEEN :from AND :to', { from: new Date(`${from}T00:00:00Z`), to: new Date(`${to}T23:59:59.999Z`) })
  if (entity) qb.andWhere('a.entity = :entity', { entity })
  const found = await qb.orderBy('a.id', 'DESC').take(1000).getMany()
  // before/after travel as JSON text, the same in the JSON answer and in a CSV cell.
  return found.map((r) => ({ ...r, id: String(r.id), at: r.at.toISOString(), before: JSON.stringify(r.before), after: JSON.stringify(r.after) }))
}
