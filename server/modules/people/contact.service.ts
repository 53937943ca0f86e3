import { db } from '../../db/data-source'
import { PersonEntity, type PersonRow } from './person.entity'

/** How escalations reach a person: what the escalation module reads and the person edits. */
export type Contact = Pick<PersonRow, 'id' | 'name' | 'email' | 'phone' | 'channels' | 'quietStart' | 'quietEnd' | 'active'>
export type ContactPatch = Partial<Pick<PersonRow, 'email' | 'phone' | 'channels' | 'quietStart' | 'quietEnd'>>

export const findContact = (id: number): Promise<Contact | null> => db().getRepository(PersonEntity).findOneBy({ id })

export async function updateContact(id: number, patch: ContactPatch): Promise<void> {
  await db().getRepository(PersonEntity).update(id, patch)
}
