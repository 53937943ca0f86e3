import bcrypt from 'bcryptjs'
import { PreferencesInputSchema, type Preferences } from '#shared/schemas/person'
import { db } from '../../db/data-source'
import { validationError } from '../../lib/errors'
import { audit } from '../audit/audit.service'
import { PersonEntity, type PersonRow } from './person.entity'
import { getPersonRow } from './people.service'

const toPreferences = (row: PersonRow): Preferences => ({ email: row.email, quietStart: row.quietStart, quietEnd: row.quietEnd })

export async function getPreferences(personId: number): Promise<Preferences> {
  return toPreferences(await getPersonRow(personId))
}

/**
 * Saves my address and quiet hours. A new sign-in address needs the current password, checked
 * before anything else is said about the address (so "already in use" is no free account probe);
 * an address someone else has is refused by the unique key as a 409.
 */
export async function updatePreferences(personId: number, input: unknown): Promise<Preferences> {
  const { currentPassword, ...changes } = PreferencesInputSchema.parse(input)
  const row = await getPersonRow(personId)
  if (changes.email !== undefined && changes.email !== row.email) {
    if (!currentPassword) throw validationError('Enter your current password to change the address you sign in with.', { currentPassword: ['Enter your current password'] })
    if (!(await bcrypt.compare(currentPassword, row.passwordHash))) {
      throw validationError('That is not your current password; nothing was saved.', { currentPassword: ['Not your current password'] })
    }
  }
  await db().getRepository(PersonEntity).update(personId, changes)
  const saved = toPreferences(await getPersonRow(personId))
  if (saved.email !== row.email) await audit('person', personId, 'update', { email: row.email }, { email: saved.email })
  return saved
}
