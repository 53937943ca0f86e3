import { randomUUID } from 'node:crypto'
import { db } from '#server/db/data-source'

/**
 * Makes the database refuse one kind of insert while `work` runs: a trigger that raises an error
 * for rows matching `when` (SQL over NEW), as a full disk or a lost connection would mid-request.
 */
export async function failingInsert<T>(table: string, when: string, work: () => Promise<T>): Promise<T> {
  const name = `fail_${table}_${randomUUID().slice(0, 8)}`
  await db().query(
    `CREATE TRIGGER ${name} BEFORE INSERT ON ${table} FOR EACH ROW BEGIN IF ${when} THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'refused by the test'; END IF; END`,
  )
  try {
    return await work()
  } finally {
    await db().query(`DROP TRIGGER ${name}`)
  }
}
