import { EntitySchema } from 'typeorm'
import { LIMIT_SCOPES, type Limit, type Parameter } from '#shared/schemas/parameter'
import { references } from '../../db/foreign-keys'

export const ParameterEntity = new EntitySchema<Parameter>({
  name: 'Parameter',
  tableName: 'parameters',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    key: { type: 'varchar', length: 40, unique: true },
    name: { type: 'varchar', length: 120 },
    unit: { type: 'varchar', length: 40 },
    decimals: { type: 'int', default: 1 },
    physicalMin: { type: 'double' },
    physicalMax: { type: 'double' },
    derived: { type: 'boolean', default: false },
    ladderId: { type: 'int', nullable: true, foreignKey: references('Ladder') },
  },
})

export const LimitEntity = new EntitySchema<Limit>({
  name: 'Limit',
  tableName: 'limits',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    parameterKey: { type: 'varchar', length: 40 },
    scope: { type: 'enum', enum: [...LIMIT_SCOPES] },
    // 0 for the facility-wide row, so the unique index below also holds for it.
    scopeId: { type: 'int', default: 0, transformer: { to: (v: number | null) => v ?? 0, from: (v: number) => (v === 0 ? null : v) } },
    okMin: { type: 'double', nullable: true },
    okMax: { type: 'double', nullable: true },
    criticalMin: { type: 'double', nullable: true },
    criticalMax: { type: 'double', nullable: true },
  },
  indices: [{ columns: ['parameterKey', 'scope', 'scopeId'], unique: true }],
})
