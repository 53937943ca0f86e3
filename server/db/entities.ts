import { AlertEntity, CompletionEntity, PhotoEntity, ReadingEntity } from '../modules/completions/completion.entities'
import {
  DigestEntity,
  LadderEntity,
  NotificationEntity,
  OutboxEntity,
  PushOutboxEntity,
  TextOutboxEntity,
  TextQuotaEntity,
} from '../modules/escalation/escalation.entities'
import { PushSubscriptionEntity } from '../modules/escalation/push-subscription.entity'
import { AuditEntity } from '../modules/audit/audit.entity'
import { AmendmentEntity } from '../modules/completions/amendment.entity'
import { AreaEntity, BatchEntity, EquipmentEntity, FacilityEntity, SystemEntity, TankEntity } from '../modules/facility/facility.entities'
import { LimitEntity, ParameterEntity } from '../modules/parameters/parameter.entities'
import { PersonEntity } from '../modules/people/person.entity'
import { IncidentEntity } from '../modules/incidents/incident.entity'
import { HandoverNoteEntity, OnCallEntity, ShiftEntity } from '../modules/roster/roster.entities'
import { CylinderEntity } from '../modules/oxygen/oxygen.entities'
import { BatchRecordEntity, EventEntity, PlaybookEntity } from '../modules/playbooks/playbook.entities'
import { RoutineEntity } from '../modules/routines/routine.entity'
import { MovementEntity, StockSettingsEntity } from '../modules/stock/stock.entities'
import { TaskEntity } from '../modules/tasks/task.entity'
import { ChangeOutboxEntity } from '../realtime/change-outbox.entity'

/** Every table the app maps; a migration must match these. */
export const entities = [
  PersonEntity,
  FacilityEntity,
  AreaEntity,
  SystemEntity,
  TankEntity,
  EquipmentEntity,
  BatchEntity,
  ParameterEntity,
  LimitEntity,
  RoutineEntity,
  TaskEntity,
  CompletionEntity,
  ReadingEntity,
  AlertEntity,
  PhotoEntity,
  ShiftEntity,
  OnCallEntity,
  HandoverNoteEntity,
  LadderEntity,
  NotificationEntity,
  OutboxEntity,
  DigestEntity,
  TextOutboxEntity,
  TextQuotaEntity,
  PushSubscriptionEntity,
  PushOutboxEntity,
  PlaybookEntity,
  EventEntity,
  BatchRecordEntity,
  CylinderEntity,
  AuditEntity,
  AmendmentEntity,
  MovementEntity,
  StockSettingsEntity,
  IncidentEntity,
  ChangeOutboxEntity,
]
