import { EntitySchema } from 'typeorm'
import { references } from '../../db/foreign-keys'

export interface CylinderRow {
  id: number
  code: string
  label: string
  method: 'metric' | 'psi-factor'
  /** Metric cylinders: water capacity in litres; pressures in bar. */
  waterCapacityL: number | null
  /** Psi-factor cylinders: litres of gas per psi on the gauge; pressures in psi. */
  factorLPerPsi: number | null
  compressibility: number | null
  reservePressure: number
  lastPressure: number | null
  flowLPerMin: number
  lastReadAt: Date | null
  active: boolean
  /** The replace task raised for this cylinder, found by id (a title can be typed by anyone). */
  replaceTaskId: number | null
}

export const CylinderEntity = new EntitySchema<CylinderRow>({
  name: 'Cylinder',
  tableName: 'oxygen_cylinders',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    code: { type: 'varchar', length: 40, unique: true },
    label: { type: 'varchar', length: 160 },
    method: { type: 'enum', enum: ['metric', 'psi-factor'] },
    waterCapacityL: { type: 'double', nullable: true },
    factorLPerPsi: { type: 'double', nullable: true },
    compressibility: { type: 'double', nullable: true },
    reservePressure: { type: 'double' },
    lastPressure: { type: 'double', nullable: true },
    flowLPerMin: { type: 'double', default: 0 },
    lastReadAt: { type: 'datetime', precision: 3, nullable: true },
    active: { type: 'boolean', default: true },
    replaceTaskId: { type: 'int', nullable: true, foreignKey: references('Task') },
  },
})
