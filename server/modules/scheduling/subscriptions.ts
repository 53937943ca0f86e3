import { tankUseChanged } from '../facility/tank-changes'
import { routineNeedsPlanning } from '../routines/routine-changes'
import { removeUntouchedFutureTasks } from '../tasks/planned-task-writes'
import { materialiseForTank, materialiseRoutine } from './materialiser'

const planRoutine = async ({ routineId }: { routineId: number }) => {
  await materialiseRoutine(routineId)
}

// An emptied tank loses its future untouched tasks; a refilled one gets them back.
const followTankUse = async ({ tankId, inUse }: { tankId: number; inUse: boolean }) => {
  if (inUse) await materialiseForTank(tankId)
  else await removeUntouchedFutureTasks({ tankId })
}

/** Scheduling plans after the changes that routines and facility announce (record 13e). */
export function subscribeScheduling() {
  routineNeedsPlanning.subscribe(planRoutine)
  tankUseChanged.subscribe(followTankUse)
}
