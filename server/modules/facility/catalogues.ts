import {
  AreaInputSchema, BatchInputSchema, EquipmentInputSchema, SystemInputSchema, TankInputSchema,
} from '#shared/schemas/facility'
import { removeUntouchedFutureTasks, materialiseForTank } from '../tasks/materialiser'
import { catalogue } from './catalogue.service'
import { AreaEntity, BatchEntity, EquipmentEntity, SystemEntity, TankEntity } from './facility.entities'

export const areas = catalogue(AreaEntity, AreaInputSchema, 'area', { order: { roundOrder: 'ASC', code: 'ASC' } })
export const systems = catalogue(SystemEntity, SystemInputSchema, 'system')
export const equipment = catalogue(EquipmentEntity, EquipmentInputSchema, 'piece of equipment')
export const batches = catalogue(BatchEntity, BatchInputSchema, 'batch', { order: { arrivalDate: 'DESC' } })
export const tanks = catalogue(TankEntity, TankInputSchema, 'tank', {
  // An emptied tank loses its future untouched tasks; a refilled one gets them back.
  onChange: async (before, after) => {
    if (before && (!after || (before.inUse && !after.inUse))) await removeUntouchedFutureTasks({ tankId: before.id })
    if (after && after.inUse && (!before || !before.inUse)) await materialiseForTank(after.id)
  },
})
