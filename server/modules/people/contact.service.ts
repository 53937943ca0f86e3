import { db } from '../../db/data-source'
import { PersonEntity, type PersonRow } from './person.entity'

/** How escalations reach a person: what the escalation module reads and the person edits. */
export type Contact = Pick<PersonRow, 'id' | 'name' | 'role' | 'email' | 'phone' | 'channels' | 'quietStart' | 'quietEnd' | 'active'>
export type ContactPatch = Partial<Pick<PersonRow, 'email' | 'phone' | 'channels' | 'quietStart' | 'quietEnd'>>

export const findContact = (id: number): Promise<Contact | null> => db().getRepository(PersonEntity).findOneBy({ id })

/** Everyone, active or not (records name people who have since left). */
export const listContacts = (): Promise<Contact[]> => db().getRepository(PersonEntity).find()

export async function updateContact(id: number, patch: ContactPatch): Promise<void> {
  await db().getRepository(PersonEntity).update(id, patch)
}
