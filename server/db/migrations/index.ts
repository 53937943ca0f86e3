import { ForeignKeys1796560000000 } from './1796560000000-ForeignKeys'
import { PushSubscriptions1796470100000 } from './1796470100000-PushSubscriptions'
import { OnCallChannels1796465534514 } from './1796465534514-OnCallChannels'
import { CylinderReplaceTask1796530013001 } from './1796530013001-CylinderReplaceTask'
import { ChangeOutbox1796530013000 } from './1796530013000-ChangeOutbox'
import { StuckSends1796541200044 } from './1796541200044-StuckSends'
import { PushOutbox1796541200045 } from './1796541200045-PushOutbox'
import { HandFiledIncidents1796570000014 } from './1796570000014-HandFiledIncidents'
import { IncidentDeadlines1796431400000 } from './1796431400000-IncidentDeadlines'
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

export const migrations: Array<new () => object> = [
  Foundation1796171166803,
  FacilityRoutinesTasks1796171523572,
  Completions1796171878307,
  Photos1796171952138,
  RosterAndMoves1796172129297,
  Escalation1796172492783,
  PlaybooksOxygen1796173176412,
  AuditAmendments1796173566142,
  StockRegister1796419091184,
  AppSecrets1796420370601,
  RoutinePlanningError1796421762016,
  Incidents1796425000000,
  IncidentDeadlines1796431400000,
  OnCallChannels1796465534514,
  PushSubscriptions1796470100000,
  ChangeOutbox1796530013000,
  CylinderReplaceTask1796530013001,
  StuckSends1796541200044,
  PushOutbox1796541200045,
  ForeignKeys1796560000000,
  HandFiledIncidents1796570000014,
]
