import type { Person } from '#shared/schemas/person'

/**
 * The person a session names, read in the same statement as the session itself (record 16h): the
 * columns to select beside the session's row, `p` being `people`, and the person they make. The
 * check that the person is still active and on the session's version stays with the caller.
 */
export const SESSION_PERSON_COLUMNS =
  'p.id AS p_id, p.email AS p_email, p.name AS p_name, p.title AS p_title, p.phone AS p_phone, p.role AS p_role, ' +
  'p.active AS p_active, p.onCallEligible AS p_onCallEligible, p.sessionVersion AS p_sessionVersion, ' +
  // Formatted on the server: the session store's pool reads datetimes in the process's zone, the column holds UTC.
  "DATE_FORMAT(p.createdAt, '%Y-%m-%dT%H:%i:%s.%fZ') AS p_createdAt"

export interface SessionPerson {
  person: Person
  active: boolean
  sessionVersion: number
}

export function sessionPersonFrom(raw: Record<string, unknown>): SessionPerson | null {
  if (raw.p_id === null || raw.p_id === undefined) return null
  return {
    person: {
      id: Number(raw.p_id),
      email: String(raw.p_email),
      name: String(raw.p_name),
      title: (raw.p_title as string | null) ?? null,
      phone: (raw.p_phone as string | null) ?? null,
      role: raw.p_role as Person['role'],
      active: Number(raw.p_active) === 1,
      onCallEligible: Number(raw.p_onCallEligible) === 1,
      createdAt: new Date(String(raw.p_createdAt)).toISOString(),
    },
    active: Number(raw.p_active) === 1,
    sessionVersion: Number(raw.p_sessionVersion),
  }
}
