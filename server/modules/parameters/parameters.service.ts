import type { Limit, LimitInput, Parameter } from '#shared/schemas/parameter'
import { audit } from '../audit/audit.service'
import { cachedRead, frozen } from '../../db/cached-read'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import { LimitEntity, ParameterEntity } from './parameter.entities'

// Read by every completion and amendment: a copy per process (record 16e).
const parametersCopy = cachedRead('parameters', async () =>
  Object.freeze(
    (
      await db()
        .getRepository(ParameterEntity)
        .find({ order: { id: 'ASC' } })
    ).map(frozen),
  ),
)
const limitsCopy = cachedRead('parameters', async () =>
  Object.freeze(
    (
      await db()
        .getRepository(LimitEntity)
        .find({ order: { parameterKey: 'ASC', scope: 'ASC' } })
    ).map(frozen),
  ),
)

export const listParameters = (): Promise<readonly Parameter[]> => parametersCopy()
export const listLimits = (): Promise<readonly Limit[]> => limitsCopy()

/** Sets the limits for one parameter at one scope, replacing what was there. */
export async function upsertLimit(data: LimitInput): Promise<Limit> {
  const repo = db().getRepository(LimitEntity)
  if (!(await db().getRepository(ParameterEntity).findOneBy({ key: data.parameterKey }))) throw notFound(`The parameter ${data.parameterKey}`)
  const existing = await repo.findOneBy({ parameterKey: data.parameterKey, scope: data.scope, scopeId: data.scopeId ?? 0 } as never)
  const saved = await repo.save({ ...(existing ?? {}), ...data })
  await audit('limit', saved.id, existing ? 'update' : 'create', existing, saved)
  return saved
}

export async function deleteLimit(id: number) {
  const before = await db().getRepository(LimitEntity).findOneBy({ id })
  if (!before) throw notFound('That limit')
  await db().getRepository(LimitEntity).delete(id)
  await audit('limit', id, 'delete', before, null)
}
