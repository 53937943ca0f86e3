import bcrypt from 'bcryptjs'
import type { CreatePersonInput, Person, StaffMember, UpdatePersonInput } from '#shared/schemas/person'
import { CreatePersonInputSchema } from '#shared/schemas/person'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { conflict, notFound } from '../../lib/errors'
import { disconnectPerson } from '../../realtime/socket-server'
import { PersonEntity, type PersonRow } from './person.entity'
import { toPerson } from './person.mapper'

const BCRYPT_COST = 10
let dummyHash: string | undefined
const repo = () => db().getRepository(PersonEntity)

export const hashPassword = (password: string) => bcrypt.hash(password, BCRYPT_COST)

export async function listPeople(): Promise<Person[]> {
  const rows = await repo().find({ order: { active: 'DESC', name: 'ASC' } })
  return rows.map(toPerson)
}

export async function listStaff(): Promise<StaffMember[]> {
  const rows = await repo().find({ where: { active: true }, order: { name: 'ASC' } })
  return rows.map((r) => ({ id: r.id, name: r.name, role: r.role, onCallEligible: r.onCallEligible, phone: r.phone }))
}

export async function getPersonRow(id: number): Promise<PersonRow> {
  const row = await repo().findOneBy({ id })
  if (!row) throw notFound('That person')
  return row
}

export async function findPersonByEmail(email: string): Promise<PersonRow | null> {
  return repo().findOneBy({ email: email.trim().toLowerCase() })
}

export async function createPerson(input: CreatePersonInput): Promise<Person> {
  const data = CreatePersonInputSchema.parse(input)
  if (await findPersonByEmail(data.email)) throw conflict(`Someone already uses ${data.email}.`)
  const row = repo().create({
    email: data.email,
    name: data.name,
    title: data.title ?? null,
    phone: data.phone ?? null,
    role: data.role,
    onCallEligible: data.onCallEligible,
    passwordHash: await hashPassword(data.password),
    active: true,
    sessionVersion: 0,
  })
  const saved = toPerson(await repo().save(row))
  await audit('person', saved.id, 'create', null, saved)
  return saved
}

export async function updatePerson(id: number, input: UpdatePersonInput): Promise<Person> {
  const row = await getPersonRow(id)
  const before = toPerson(row)
  const endsSessions = input.active === false && row.active
  Object.assign(row, input)
  if (endsSessions) row.sessionVersion += 1
  const saved = toPerson(await repo().save(row))
  await audit('person', id, 'update', before, saved)
  if (endsSessions) disconnectPerson(id)
  return saved
}

export async function resetPassword(id: number, password: string): Promise<Person> {
  const row = await getPersonRow(id)
  row.passwordHash = await hashPassword(password)
  row.sessionVersion += 1
  const saved = toPerson(await repo().save(row))
  await audit('person', id, 'update', null, { passwordReset: true })
  // Older sessions end on their next request; their open live feeds end now.
  disconnectPerson(id)
  return saved
}

/** Checks a password; returns the person only when active and the password matches. */
export async function verifyCredentials(email: string, password: string): Promise<PersonRow | null> {
  const row = await findPersonByEmail(email)
  // Compare against a dummy hash when nobody matches, so timing does not reveal who exists.
  dummyHash ??= await hashPassword('nobody-has-this-password')
  const hash = row?.passwordHash ?? dummyHash
  const ok = await bcrypt.compare(password, hash)
  return row && ok && row.active ? row : null
}
