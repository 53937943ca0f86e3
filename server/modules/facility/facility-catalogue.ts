import type { Area, Batch, Equipment, Facility, System, Tank } from '#shared/schemas/facility'
import { cachedRead, frozen } from '../../db/cached-read'
import { db } from '../../db/data-source'
import { AreaEntity, BatchEntity, EquipmentEntity, SystemEntity, TankEntity } from './facility.entities'
import { getFacility } from './facility.service'

/** The facility and its catalogues by id, as other modules read them. */
export interface Catalogue {
  facility: Facility
  areas: Map<number, Area>
  systems: Map<number, System>
  tanks: Map<number, Tank>
  equipment: Map<number, Equipment>
  batches: Map<number, Batch>
}

const byId = <T extends { id: number }>(rows: T[]) => new Map(rows.map((r) => [r.id, frozen(r)]))

const catalogueCopy = cachedRead('catalogue', async (): Promise<Catalogue> => {
  const [facility, areas, systems, tanks, equipment, batches] = await Promise.all([
    getFacility(),
    db().getRepository(AreaEntity).find(),
    db().getRepository(SystemEntity).find(),
    db().getRepository(TankEntity).find(),
    db().getRepository(EquipmentEntity).find(),
    db().getRepository(BatchEntity).find(),
  ])
  return { facility, areas: byId(areas), systems: byId(systems), tanks: byId(tanks), equipment: byId(equipment), batches: byId(batches) }
})

/**
 * The facility's structure in memory: small enough to load whole, and it saves joins. A copy per
 * process (record 16e); `has` names what the caller needs, and a copy without it is loaded again.
 */
export const loadCatalogue = (has?: (cat: Catalogue) => boolean): Promise<Catalogue> => catalogueCopy(has)
