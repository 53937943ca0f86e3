import type { DataSource } from 'typeorm'

/** One foreign key as information_schema tells it. */
export interface KeyRow {
  TABLE_NAME: string
  COLUMN_NAME: string
  REFERENCED_TABLE_NAME: string
  DELETE_RULE: string
}

/** Every foreign key in the database this source is connected to. */
export const keysIn = (ds: DataSource): Promise<KeyRow[]> =>
  ds.query(
    `SELECT k.TABLE_NAME, k.COLUMN_NAME, k.REFERENCED_TABLE_NAME, r.DELETE_RULE
       FROM information_schema.KEY_COLUMN_USAGE k
       JOIN information_schema.REFERENTIAL_CONSTRAINTS r ON r.CONSTRAINT_SCHEMA = k.CONSTRAINT_SCHEMA AND r.CONSTRAINT_NAME = k.CONSTRAINT_NAME
      WHERE k.TABLE_SCHEMA = DATABASE() AND k.REFERENCED_TABLE_NAME IS NOT NULL`,
  )

/** "parent RULE" for the key on table.column, or undefined when there is none. */
export const ruleOf = (keys: KeyRow[], table: string, column: string) => {
  const key = keys.find((k) => k.TABLE_NAME === table && k.COLUMN_NAME === column)
  return key && `${key.REFERENCED_TABLE_NAME} ${key.DELETE_RULE}`
}
