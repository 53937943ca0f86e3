import type { Person } from '#shared/schemas/person'
import type { PersonRow } from './person.entity'

export function toPerson(row: PersonRow): Person {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    title: row.title,
    phone: row.phone,
    role: row.role,
    active: row.active,
    onCallEligible: row.onCallEligible,
    createdAt: row.createdAt.toISOString(),
  }
}
