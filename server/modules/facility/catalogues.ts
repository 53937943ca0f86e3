import { AreaInputSchema, BatchInputSchema, EquipmentInputSchema, SystemInputSchema, TankInputSchema } from '#shared/schemas/facility'
import { db } from '../../db/data-source'
import { conflict, validationError } from '../../lib/errors'
import { catalogue } from './catalogue.service'
import { AreaEntity, BatchEntity, EquipmentEntity, SystemEntity, TankEntity } from './facility.entities'
import { tankUseChanged } from './tank-changes'

async function mustExist(entity: typeof AreaEntity | typeof SystemEntity | typeof TankEntity, id: number | null | undefined, field: string, label: string) {
  if (id === null || id === undefined) return
  if (!(await db().getRepository(entity).countBy({ id }))) throw validationError(`That ${label} does not exist.`, { [field]: [`Choose an existing ${label}`] })
}

async function mustBeEmpty(column: 'areaId' | 'systemId', id: number, label: string) {
  const count = await db()
    .getRepository(TankEntity)
    .countBy({ [column]: id })
  if (count) throw conflict(`This ${label} still holds ${count} tank${count === 1 ? '' : 's'}; move or delete them first.`)
}

export const areas = catalogue(AreaEntity, AreaInputSchema, 'area', {
  order: { roundOrder: 'ASC', code: 'ASC' },
  checkRemovable: async (area) => {
    await mustBeEmpty('areaId', area.id, 'area')
    if (await db().getRepository(SystemEntity).countBy({ areaId: area.id })) throw conflict('Systems still belong to this area; move or delete them first.')
  },
})
export const systems = catalogue(SystemEntity, SystemInputSchema, 'system', {
  checkRefs: (s) => mustExist(AreaEntity, s.areaId, 'areaId', 'area'),
  checkRemovable: (s) => mustBeEmpty('systemId', s.id, 'system'),
})
export const equipment = catalogue(EquipmentEntity, EquipmentInputSchema, 'piece of equipment', {
  checkRefs: (e) => mustExist(AreaEntity, e.areaId, 'areaId', 'area'),
})
export const batches = catalogue(BatchEntity, BatchInputSchema, 'batch', {
  order: { arrivalDate: 'DESC' },
  checkRefs: async (b) => {
    for (const id of b.tankIds ?? []) await mustExist(TankEntity, id, 'tankIds', 'tank')
  },
})
export const tanks = catalogue(TankEntity, TankInputSchema, 'tank', {
  checkRefs: async (t) => {
    await mustExist(AreaEntity, t.areaId, 'areaId', 'area')
    await mustExist(SystemEntity, t.systemId, 'systemId', 'system')
  },
  // A deleted tank's untouched future tasks go first, so only its history (record 13f) can keep it.
  beforeRemove: (tank) => tankUseChanged.announce({ tankId: tank.id, inUse: false }),
  // An emptied tank loses its future untouched tasks; a refilled one gets them back.
  onChange: async (before, after) => {
    if (before && after && before.inUse && !after.inUse) await tankUseChanged.announce({ tankId: before.id, inUse: false })
    if (after && after.inUse && (!before || !before.inUse)) await tankUseChanged.announce({ tankId: after.id, inUse: true })
    if (before && !after) {
      // A deleted tank leaves the batches that listed it.
      const repo = db().getRepository(BatchEntity)
      for (const b of (await repo.find()).filter((x) => x.tankIds.includes(before.id)))
        await repo.save({ ...b, tankIds: b.tankIds.filter((id) => id !== before.id) })
    }
  },
})
