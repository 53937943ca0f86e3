import { In } from 'typeorm'
import { cachedRead } from '../../db/cached-read'
import { db } from '../../db/data-source'
import { PersonEntity, type PersonRow } from './person.entity'

/** Reads of people other modules need (roster checks, names on cards), so they never query the entity. */
const people = () => db().getRepository(PersonEntity)

export type { PersonRow }

/** The person with this id, active or not, or null. */
export const findPerson = (id: number): Promise<PersonRow | null> => people().findOneBy({ id })

/** The people with these ids that exist. */
export const findPeople = (ids: number[]): Promise<PersonRow[]> => (ids.length ? people().findBy({ id: In(ids) }) : Promise.resolve([]))

/** The ids of everyone still active (a routine's named person who left assigns nobody). */
export async function activePersonIds(): Promise<Set<number>> {
  return new Set((await people().find({ select: { id: true }, where: { active: true } })).map((p) => p.id))
}

const namesCopy = cachedRead('people', async () => new Map((await people().find({ select: { id: true, name: true } })).map((p) => [p.id, p.name])))

/**
 * Everyone's name by id, former staff too (old records still name them). A copy per process
 * (record 16e); pass the ids the caller needs, and a copy without one of them is loaded again.
 */
export const personNames = (needed: ReadonlyArray<number | null> = []): Promise<ReadonlyMap<number, string>> =>
  namesCopy((names) => needed.every((id) => id === null || names.has(id)))
