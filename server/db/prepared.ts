import { QueryFailedError, type EntityTarget, type ObjectLiteral } from 'typeorm'
import { isCachedTable } from './cache-generations'
import { db } from './data-source'

/** The callback side of a mysql2 connection (the promise side captures a stack trace per call). */
interface DriverConnection {
  execute(sql: string, params: unknown[], callback: (err: Error | null, result: unknown) => void): void
}

/** Past this many rows an insert goes through TypeORM: each row count is a statement of its own on the server. */
const MAX_PREPARED_ROWS = 8

/**
 * Runs one fixed statement through `db()` (record 16h): inside a transaction as a prepared
 * statement (mysql2 `execute`, kept per connection) on that transaction's connection, skipping
 * TypeORM's query building; outside one through TypeORM's pool. Errors are TypeORM's
 * `QueryFailedError` either way, so the callers' checks of the driver's error still hold.
 */
export function execute<T>(sql: string, params: unknown[]): Promise<T> {
  const manager = db()
  const runner = manager.queryRunner
  const connection = runner && !runner.isReleased ? (runner as unknown as { databaseConnection?: DriverConnection }).databaseConnection : undefined
  if (!connection) return manager.query(sql, params) as Promise<T>
  return new Promise<T>((resolve, reject) => {
    connection.execute(sql, params, (err, result) => (err ? reject(new QueryFailedError(sql, params, err)) : resolve(result as T)))
  })
}

/** A row read by hand, converted as TypeORM converts its own reads of that entity (dates, JSON, booleans). */
export function hydrated<T extends ObjectLiteral>(target: EntityTarget<T>, raw: Record<string, unknown>): T {
  const { connection } = db()
  const row: Record<string, unknown> = {}
  for (const column of connection.getMetadata(target).columns) {
    row[column.propertyName] = connection.driver.prepareHydratedValue(raw[column.databaseName], column)
  }
  return row as T
}

/** The row with this primary key, or null; a prepared `SELECT *` in place of a `findOneBy`. */
export async function findById<T extends ObjectLiteral>(target: EntityTarget<T>, id: number | string): Promise<T | null> {
  const metadata = db().connection.getMetadata(target)
  const [key] = metadata.primaryColumns
  const rows = await execute<Array<Record<string, unknown>>>(`SELECT * FROM \`${metadata.tableName}\` WHERE \`${key.databaseName}\` = ?`, [id])
  return rows.length ? hydrated(target, rows[0]) : null
}

/**
 * Inserts rows that state the same fields, as a prepared statement when there are few (a
 * completion's record, readings, audit and outbox rows), else through TypeORM's insert. Fields
 * left undefined take the column's default, as they do in TypeORM's insert. Nothing is read back
 * (no generated ids): callers that need them use the repository.
 */
export async function insertRows<T extends ObjectLiteral>(target: EntityTarget<T>, rows: ReadonlyArray<Partial<T>>): Promise<void> {
  if (!rows.length) return
  const { connection } = db()
  const metadata = connection.getMetadata(target)
  // Writes to the tables the process keeps copies of stay where the cache invalidator sees them (record 16e).
  if (rows.length > MAX_PREPARED_ROWS || isCachedTable(metadata.tableName)) {
    await db()
      .getRepository(target)
      .insert(rows as never)
    return
  }
  const columns = metadata.columns.filter((c) => rows[0][c.propertyName] !== undefined)
  const params: unknown[] = []
  for (const row of rows) {
    for (const c of columns) params.push(connection.driver.preparePersistentValue(row[c.propertyName], c) ?? null)
  }
  const names = columns.map((c) => `\`${c.databaseName}\``).join(', ')
  const tuple = `(${columns.map(() => '?').join(', ')})`
  await execute(`INSERT INTO \`${metadata.tableName}\` (${names}) VALUES ${rows.map(() => tuple).join(', ')}`, params)
}
