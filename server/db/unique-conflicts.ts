import { AppError } from '../lib/errors'
import { dataSourceIfSet } from './data-source'
import { duplicateKeyName, foreignKeyRefusal } from './database-errors'

/** Words for the columns people choose values for; any other unique column reads as "value". */
const COLUMN_WORDS: Record<string, string> = { email: 'e-mail address', code: 'code', key: 'key', name: 'name' }

function columnsOfKey(keyName: string): string[] {
  for (const meta of dataSourceIfSet()?.entityMetadatas ?? []) {
    for (const index of [...meta.indices, ...meta.uniques]) {
      if (index.name === keyName) return index.columns.map((c) => c.propertyName)
    }
  }
  return []
}

/**
 * The one translation of a unique-key clash into an answer: 409 with a plain message naming
 * the field, never a 500. Services may check first for a friendlier message; this catches what
 * they do not check and the race between their check and the write.
 */
export function duplicateKeyConflict(err: unknown): AppError | null {
  const keyName = duplicateKeyName(err)
  if (keyName === null) return null
  const columns = columnsOfKey(keyName)
  const single = columns.length === 1 ? columns[0] : undefined
  const words = single ? (COLUMN_WORDS[single] ?? 'value') : 'combination'
  return new AppError(
    409,
    'conflict',
    `That ${words} is already in use. Choose another and try again.`,
    single ? { fieldErrors: { [single]: ['Already in use'] } } : {},
  )
}

/**
 * A write the foreign keys refused, as 409: what it points at was removed meanwhile, or what it
 * removes is still part of someone's record. Services check first; this covers the race.
 */
export function foreignKeyConflict(err: unknown): AppError | null {
  const refusal = foreignKeyRefusal(err)
  if (!refusal) return null
  if (refusal.kind === 'in-use') return new AppError(409, 'conflict', 'That is still part of other records, so it cannot be removed.')
  const { column } = refusal
  return new AppError(
    409,
    'conflict',
    'That refers to something that no longer exists. Reload and try again.',
    column ? { fieldErrors: { [column]: ['No longer exists'] } } : {},
  )
}
