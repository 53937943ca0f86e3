import { EntitySchema } from 'typeorm'
import { BATCH_STATUSES, TANK_KINDS, type Area, type Batch, type Equipment, type Facility, type System, type Tank } from '#shared/schemas/facility'
import { references } from '../../db/foreign-keys'

// Decimal columns come back from mysql2 as strings; this keeps numbers numbers.
const decimalAsNumber = { to: (v: number | null) => v, from: (v: string | null) => (v == null ? null : Number(v)) }

export const FacilityEntity = new EntitySchema<Facility>({
  name: 'Facility',
  tableName: 'facilities',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    name: { type: 'varchar', length: 120 },
    timeZone: { type: 'varchar', length: 64 },
    handoverTime: { type: 'varchar', length: 5, default: '08:00' },
    quarantineDays: { type: 'int', default: 30 },
    arrivalTempDiffLimitC: { type: 'decimal', precision: 4, scale: 1, default: 2, transformer: decimalAsNumber },
    minOxygenHours: { type: 'decimal', precision: 6, scale: 1, default: 12, transformer: decimalAsNumber },
    defaultLadderId: { type: 'int', nullable: true, foreignKey: references('Ladder') },
    fastLadderId: { type: 'int', nullable: true, foreignKey: references('Ladder') },
    digestTime: { type: 'varchar', length: 5, default: '07:00' },
  },
})

export const AreaEntity = new EntitySchema<Area>({
  name: 'Area',
  tableName: 'areas',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    code: { type: 'varchar', length: 40, unique: true },
    name: { type: 'varchar', length: 120 },
    roundOrder: { type: 'int', default: 0 },
    quarantine: { type: 'boolean', default: false },
  },
})

export const SystemEntity = new EntitySchema<System>({
  name: 'System',
  tableName: 'systems',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    code: { type: 'varchar', length: 40, unique: true },
    name: { type: 'varchar', length: 120 },
    areaId: { type: 'int', nullable: true, foreignKey: references('Area') },
    volumeL: { type: 'double' },
    salinitySetpoint: { type: 'double', nullable: true },
  },
})

export const TankEntity = new EntitySchema<Tank>({
  name: 'Tank',
  tableName: 'tanks',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    code: { type: 'varchar', length: 40, unique: true },
    name: { type: 'varchar', length: 120 },
    areaId: { type: 'int', foreignKey: references('Area') },
    systemId: { type: 'int', nullable: true, foreignKey: references('System') },
    volumeL: { type: 'double' },
    kind: { type: 'enum', enum: [...TANK_KINDS], default: 'tank' },
    inUse: { type: 'boolean', default: true },
  },
  indices: [{ columns: ['areaId'] }, { columns: ['systemId'] }],
})

export const EquipmentEntity = new EntitySchema<Equipment>({
  name: 'Equipment',
  tableName: 'equipment',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    code: { type: 'varchar', length: 40, unique: true },
    name: { type: 'varchar', length: 120 },
    kind: { type: 'varchar', length: 60 },
    areaId: { type: 'int', nullable: true, foreignKey: references('Area') },
  },
})

export const BatchEntity = new EntitySchema<Batch>({
  name: 'Batch',
  tableName: 'batches',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    code: { type: 'varchar', length: 40, unique: true },
    species: { type: 'varchar', length: 120 },
    origin: { type: 'varchar', length: 200, default: '' },
    arrivalDate: { type: 'varchar', length: 10 },
    count: { type: 'int' },
    meanWeightG: { type: 'double' },
    tankIds: { type: 'json' },
    status: { type: 'enum', enum: [...BATCH_STATUSES], default: 'active' },
    feedRatePct: { type: 'double', nullable: true },
  },
})
