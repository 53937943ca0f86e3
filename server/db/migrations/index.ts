import { Incidents1796425000000 } from './1796425000000-Incidents'
import { RoutinePlanningError1796421762016 } from './1796421762016-RoutinePlanningError'
import { AppSecrets1796420370601 } from './1796420370601-AppSecrets'
import { StockRegister1796419091184 } from './1796419091184-StockRegister'
import { AuditAmendments1796173566142 } from './1796173566142-AuditAmendments'
import { PlaybooksOxygen1796173176412 } from './1796173176412-PlaybooksOxygen'
import { Escalation1796172492783 } from './1796172492783-Escalation'
import { RosterAndMoves1796172129297 } from './1796172129297-RosterAndMoves'
import { Photos1796171952138 } from './1796171952138-Photos'
import { Completions1796171878307 } from './1796171878307-Completions'
import { FacilityRoutinesTasks1796171523572 } from './1796171523572-FacilityRoutinesTasks'
import { Foundation1796171166803 } from './1796171166803-Foundation'

export const migrations: Array<new () => object> = [Foundation1796171166803, FacilityRoutinesTasks1796171523572, Completions1796171878307, Photos1796171952138, RosterAndMoves1796172129297, Escalation1796172492783, PlaybooksOxygen1796173176412, AuditAmendments1796173566142, StockRegister1796419091184, AppSecrets1796420370601, RoutinePlanningError1796421762016, Incidents1796425000000]
