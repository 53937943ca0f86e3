import type { Facility, UpdateFacilityInput } from '#shared/schemas/facility'
import { audit } from '../audit/audit.service'
import { cachedRead, frozen } from '../../db/cached-read'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import { FacilityEntity } from './facility.entities'

const repo = () => db().getRepository(FacilityEntity)

/** Roundtide runs one facility per database; the first row is it. A copy per process (record 16e). */
export const getFacility = cachedRead('catalogue', async (): Promise<Facility> => {
  const [row] = await repo().find({ order: { id: 'ASC' }, take: 1 })
  if (!row) throw notFound('The facility (run the seed or create it first)')
  return frozen(row)
})

export async function updateFacility(data: UpdateFacilityInput): Promise<Facility> {
  const current = await getFacility()
  const saved = await repo().save({ ...current, ...data })
  await audit('facility', current.id, 'update', current, saved)
  return saved
}

type NewFacility = Omit<Facility, 'id' | 'defaultLadderId' | 'fastLadderId' | 'digestTime'> &
  Partial<Pick<Facility, 'defaultLadderId' | 'fastLadderId' | 'digestTime'>>

export async function createFacilityIfMissing(facility: NewFacility): Promise<Facility> {
  const [row] = await repo().find({ order: { id: 'ASC' }, take: 1 })
  return row ?? repo().save(repo().create({ defaultLadderId: null, fastLadderId: null, digestTime: '07:00', ...facility }))
}
