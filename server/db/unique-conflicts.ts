import { AppError } from '../lib/errors'
import { dataSourceIfSet } from './data-source'
import { duplicateKeyName } from './database-errors'

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
