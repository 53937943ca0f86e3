import { EntitySchema } from 'typeorm'
import { MOVEMENT_KINDS, type MovementKind } from '#shared/schemas/stock'
import { createdAtColumn } from '../../db/timestamps'
import { references } from '../../db/foreign-keys'

export interface MovementRow {
  id: number
  batchId: number
  kind: MovementKind
  occurredAt: Date
  fromTankId: number | null
  /** Where fish arrived or were moved to; for a correction, the tank whose count it changes. */
  toTankId: number | null
  /** Fish moved (positive); for a correction the signed change. */
  count: number
  meanWeightG: number | null
  origin: string | null
  permitRef: string | null
  healthCertificateRef: string | null
  transportWater: { tempC: number | null; pH: number | null; doMgL: number | null } | null
  destination: string | null
  reason: string | null
  cause: string | null
  causeText: string | null
  necropsy: boolean
  correctsId: number | null
  completionId: string | null
  /** "completion:<id>" or "amendment:<id>": one movement per round record, however often it is replayed. */
  sourceKey: string | null
  note: string | null
  personId: number
  createdAt: Date
}

/** The stock register: rows are only ever added; corrections are new rows pointing at what they correct. */
export const MovementEntity = new EntitySchema<MovementRow>({
  name: 'StockMovement',
  tableName: 'stock_movements',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    batchId: { type: 'int', foreignKey: references('Batch') },
    kind: { type: 'enum', enum: [...MOVEMENT_KINDS] },
    occurredAt: { type: 'datetime', precision: 3 },
    fromTankId: { type: 'int', nullable: true, foreignKey: references('Tank') },
    toTankId: { type: 'int', nullable: true, foreignKey: references('Tank') },
    count: { type: 'int' },
    meanWeightG: { type: 'double', nullable: true },
    origin: { type: 'varchar', length: 200, nullable: true },
    permitRef: { type: 'varchar', length: 120, nullable: true },
    healthCertificateRef: { type: 'varchar', length: 120, nullable: true },
    transportWater: { type: 'json', nullable: true },
    destination: { type: 'varchar', length: 200, nullable: true },
    reason: { type: 'varchar', length: 500, nullable: true },
    cause: { type: 'varchar', length: 80, nullable: true },
    causeText: { type: 'varchar', length: 500, nullable: true },
    necropsy: { type: 'boolean', default: false },
    correctsId: { type: 'int', nullable: true, foreignKey: references('StockMovement') },
    completionId: { type: 'varchar', length: 36, nullable: true, foreignKey: references('Completion') },
    sourceKey: { type: 'varchar', length: 60, nullable: true, unique: true },
    note: { type: 'text', nullable: true },
    personId: { type: 'int', foreignKey: references('Person') },
    createdAt: createdAtColumn,
  },
  indices: [{ columns: ['batchId', 'occurredAt'] }, { columns: ['fromTankId'] }, { columns: ['toTankId'] }, { columns: ['completionId'] }],
})

export interface StockSettingsRow {
  id: number
  mortalityCauses: string[]
  mortalityWeekPct: number
  notifyWelfareOfficerHours: number
  notifyCommitteeHours: number
  fullReportHours: number
}

/** One row: the facility's cause list, mortality threshold and incident reporting deadlines. */
export const StockSettingsEntity = new EntitySchema<StockSettingsRow>({
  name: 'StockSettings',
  tableName: 'animal_record_settings',
  columns: {
    id: { type: 'int', primary: true },
    mortalityCauses: { type: 'json' },
    mortalityWeekPct: { type: 'double', default: 2 },
    notifyWelfareOfficerHours: { type: 'int', default: 24 },
    notifyCommitteeHours: { type: 'int', default: 72 },
    fullReportHours: { type: 'int', default: 168 },
  },
})
