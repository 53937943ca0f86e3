import { LimitInputSchema, type Limit, type Parameter } from '#shared/schemas/parameter'
import { db } from '../../db/data-source'
import { notFound } from '../../lib/errors'
import { LimitEntity, ParameterEntity } from './parameter.entities'

export const listParameters = (): Promise<Parameter[]> => db().getRepository(ParameterEntity).find({ order: { id: 'ASC' } })
export const listLimits = (): Promise<Limit[]> => db().getRepository(LimitEntity).find({ order: { parameterKey: 'ASC', scope: 'ASC' } })

/** Sets the limits for one parameter at one scope, replacing what was there. */
export async function upsertLimit(input: unknown): Promise<Limit> {
  const data = LimitInputSchema.parse(input)
  const repo = db().getRepository(LimitEntity)
  if (!(await db().getRepository(ParameterEntity).findOneBy({ key: data.parameterKey }))) throw notFound(`The parameter ${data.parameterKey}`)
  const existing = await repo.findOneBy({ parameterKey: data.parameterKey, scope: data.scope, scopeId: data.scopeId ?? 0 } as never)
  return repo.save({ ...(existing ?? {}), ...data })
}

export async function deleteLimit(id: number) {
  const result = await db().getRepository(LimitEntity).delete(id)
  if (!result.affected) throw notFound('That limit')
}
