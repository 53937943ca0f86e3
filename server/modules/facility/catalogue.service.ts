import type { EntitySchema, ObjectLiteral } from 'typeorm'
import type { z } from 'zod'
import { db } from '../../db/data-source'
import { conflict, notFound } from '../../lib/errors'
import { recordChange } from '../../realtime/change-outbox'

type WithId = ObjectLiteral & { id: number }

/**
 * Plain list/get/create/update/remove for the facility's catalogues (areas, systems, tanks,
 * equipment, batches): they differ only in shape, so one set of functions serves them all.
 */
export function catalogue<T extends WithId, S extends z.ZodType<Omit<T, 'id'>>>(
  entity: EntitySchema<T>,
  inputSchema: S,
  label: string,
  opts: {
    order?: Record<string, 'ASC' | 'DESC'>
    onChange?: (before: T | null, after: T | null) => Promise<void>
    /** Checks references (e.g. a tank's area exists) before a save; throws to refuse. */
    checkRefs?: (data: Partial<T>) => Promise<void>
    /** Refuses removing something still in use (e.g. an area that holds tanks). */
    checkRemovable?: (row: T) => Promise<void>
    /** Clears what may go with the row, before the foreign keys judge the delete; a refusal undoes it with the request. */
    beforeRemove?: (row: T) => Promise<unknown>
  } = {},
) {
  type Input = z.output<S>
  const repo = () => db().getRepository(entity)
  // A change may name any of the fields; the catalogues' input shapes are plain objects.
  const updateSchema = (inputSchema as unknown as z.ZodObject).partial() as unknown as z.ZodType<Partial<Input>>

  async function get(id: number): Promise<T> {
    const row = await repo().findOneBy({ id } as never)
    if (!row) throw notFound(`That ${label}`)
    return row
  }

  async function assertCodeFree(code: unknown, exceptId?: number) {
    if (typeof code !== 'string') return
    const other = await repo().findOneBy({ code } as never)
    if (other && other.id !== exceptId) throw conflict(`Another ${label} already has the code ${code}.`)
  }

  return {
    /** The shapes the routes parse a new entry and a change with. */
    createSchema: inputSchema as unknown as z.ZodType<Input>,
    updateSchema,
    list: () => repo().find({ order: (opts.order ?? { code: 'ASC' }) as never }),
    get,
    async create(data: Input): Promise<T> {
      await assertCodeFree((data as ObjectLiteral).code)
      await opts.checkRefs?.(data as Partial<T>)
      const saved = (await repo().save(repo().create(data as never))) as unknown as T
      await opts.onChange?.(null, saved)
      await recordChange('catalogue', [saved.id])
      return saved
    },
    async update(id: number, data: Partial<Input>): Promise<T> {
      const before = await get(id)
      await assertCodeFree((data as ObjectLiteral).code, id)
      await opts.checkRefs?.(data as Partial<T>)
      const after = await repo().save({ ...before, ...data })
      await opts.onChange?.(before, after)
      await recordChange('catalogue', [id])
      return after
    },
    async remove(id: number): Promise<void> {
      const before = await get(id)
      await opts.checkRemovable?.(before)
      await opts.beforeRemove?.(before)
      try {
        await repo().delete(id)
      } catch (err) {
        if ((err as { code?: string }).code === 'ER_ROW_IS_REFERENCED_2') throw conflict(`That ${label} is still in use.`)
        throw err
      }
      await opts.onChange?.(before, null)
      await recordChange('catalogue', [id])
    },
  }
}
