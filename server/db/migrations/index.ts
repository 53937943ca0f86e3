import { FacilityRoutinesTasks1796171523572 } from './1796171523572-FacilityRoutinesTasks'
import { Foundation1796171166803 } from './1796171166803-Foundation'

export const migrations: Array<new () => object> = [Foundation1796171166803, FacilityRoutinesTasks1796171523572]
