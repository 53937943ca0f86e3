import { moduleHook } from '../../lib/module-hook'

/**
 * A routine was created or changed and its tasks must be planned again. Planning belongs to
 * scheduling, a module above this one, which subscribes at startup (record 13e).
 */
export const routineNeedsPlanning = moduleHook<{ routineId: number }>('routine needs planning')
