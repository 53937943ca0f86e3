import { moduleHook } from '../../lib/module-hook'

/**
 * A tank was filled or emptied (or added in use, or removed): its routine tasks must be planned
 * or cleared. Planning belongs to scheduling, a module above this one, which subscribes at
 * startup (record 13e).
 */
export const tankUseChanged = moduleHook<{ tankId: number; inUse: boolean }>('tank use changed')
