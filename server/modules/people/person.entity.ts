import { EntitySchema } from 'typeorm'
import type { Channel } from '#shared/schemas/ladder'
import { ROLES, type Role } from '#shared/schemas/person'
import { createdAtColumn, updatedAtColumn } from '../../db/timestamps'

export interface PersonRow {
  id: number
  email: string
  name: string
  title: string | null
  phone: string | null
  role: Role
  passwordHash: string
  active: boolean
  onCallEligible: boolean
  /** Bumped on deactivation or password reset so every older session stops working. */
  sessionVersion: number
  /** Routine mail waits outside these local hours; critical and welfare-critical mail never waits. */
  quietStart: string | null
  quietEnd: string | null
  /** The channels this person accepts escalations by; null reads as e-mail only. */
  channels: Channel[] | null
  createdAt: Date
  updatedAt: Date
}

export const PersonEntity = new EntitySchema<PersonRow>({
  name: 'Person',
  tableName: 'people',
  columns: {
    id: { type: 'int', primary: true, generated: 'increment' },
    email: { type: 'varchar', length: 200, unique: true },
    name: { type: 'varchar', length: 120 },
    title: { type: 'varchar', length: 160, nullable: true },
    phone: { type: 'varchar', length: 40, nullable: true },
    role: { type: 'enum', enum: [...ROLES] },
    passwordHash: { type: 'varchar', length: 100 },
    active: { type: 'boolean', default: true },
    onCallEligible: { type: 'boolean', default: false },
    sessionVersion: { type: 'int', default: 0 },
    quietStart: { type: 'varchar', length: 5, nullable: true },
    quietEnd: { type: 'varchar', length: 5, nullable: true },
    channels: { type: 'json', nullable: true },
    createdAt: createdAtColumn,
    updatedAt: updatedAtColumn,
  },
})
