import type { MigrationInterface, QueryRunner } from 'typeorm'

type OnDelete = 'RESTRICT' | 'SET NULL'
/** What to do with rows that already point at nothing: stop and say so, or clear the pointer (record 13f). */
type Orphans = 'fail' | 'null'

// table, id column, referenced table (by its `id`), on delete, orphans. Polymorphic pointers
// (tasks.targetId, limits.scopeId, audit_log.entityId, change_outbox.entityId) and id lists kept
// as JSON (tankIds, batchIds, personIds, targetIds) cannot carry a key and are left out.
const KEYS: Array<[string, string, string, OnDelete, Orphans]> = [
  ['tasks', 'routineId', 'routines', 'SET NULL', 'null'],
  ['tasks', 'eventId', 'events', 'RESTRICT', 'fail'],
  ['tasks', 'tankId', 'tanks', 'RESTRICT', 'fail'],
  ['tasks', 'areaId', 'areas', 'RESTRICT', 'fail'],
  ['tasks', 'assigneeId', 'people', 'RESTRICT', 'fail'],
  ['tasks', 'completedById', 'people', 'RESTRICT', 'fail'],
  ['tasks', 'recheckOfTaskId', 'tasks', 'RESTRICT', 'fail'],
  ['completions', 'taskId', 'tasks', 'RESTRICT', 'fail'],
  ['completions', 'personId', 'people', 'RESTRICT', 'fail'],
  ['completions', 'enteredById', 'people', 'RESTRICT', 'fail'],
  ['readings', 'completionId', 'completions', 'RESTRICT', 'fail'],
  ['readings', 'taskId', 'tasks', 'RESTRICT', 'fail'],
  ['readings', 'tankId', 'tanks', 'RESTRICT', 'fail'],
  ['readings', 'systemId', 'systems', 'RESTRICT', 'fail'],
  ['readings', 'personId', 'people', 'RESTRICT', 'fail'],
  ['readings', 'amendmentId', 'completion_amendments', 'RESTRICT', 'fail'],
  ['alerts', 'taskId', 'tasks', 'RESTRICT', 'fail'],
  ['alerts', 'ladderId', 'ladders', 'RESTRICT', 'fail'],
  ['alerts', 'acknowledgedById', 'people', 'RESTRICT', 'fail'],
  ['photos', 'taskId', 'tasks', 'RESTRICT', 'fail'],
  ['photos', 'personId', 'people', 'RESTRICT', 'fail'],
  ['completion_amendments', 'completionId', 'completions', 'RESTRICT', 'fail'],
  ['completion_amendments', 'personId', 'people', 'RESTRICT', 'fail'],
  ['facilities', 'defaultLadderId', 'ladders', 'RESTRICT', 'fail'],
  ['facilities', 'fastLadderId', 'ladders', 'RESTRICT', 'fail'],
  ['systems', 'areaId', 'areas', 'RESTRICT', 'fail'],
  ['tanks', 'areaId', 'areas', 'RESTRICT', 'fail'],
  ['tanks', 'systemId', 'systems', 'RESTRICT', 'fail'],
  ['equipment', 'areaId', 'areas', 'RESTRICT', 'fail'],
  ['parameters', 'ladderId', 'ladders', 'RESTRICT', 'fail'],
  ['routines', 'ladderId', 'ladders', 'RESTRICT', 'fail'],
  ['incidents', 'taskId', 'tasks', 'RESTRICT', 'fail'],
  ['incidents', 'decidedById', 'people', 'RESTRICT', 'fail'],
  ['audit_log', 'personId', 'people', 'RESTRICT', 'fail'],
  ['events', 'playbookId', 'playbooks', 'RESTRICT', 'fail'],
  ['events', 'batchId', 'batches', 'RESTRICT', 'fail'],
  ['events', 'createdById', 'people', 'RESTRICT', 'fail'],
  ['batch_records', 'batchId', 'batches', 'RESTRICT', 'fail'],
  ['batch_records', 'eventId', 'events', 'RESTRICT', 'fail'],
  ['batch_records', 'personId', 'people', 'RESTRICT', 'fail'],
  ['stock_movements', 'batchId', 'batches', 'RESTRICT', 'fail'],
  ['stock_movements', 'fromTankId', 'tanks', 'RESTRICT', 'fail'],
  ['stock_movements', 'toTankId', 'tanks', 'RESTRICT', 'fail'],
  ['stock_movements', 'correctsId', 'stock_movements', 'RESTRICT', 'fail'],
  ['stock_movements', 'completionId', 'completions', 'RESTRICT', 'fail'],
  ['stock_movements', 'personId', 'people', 'RESTRICT', 'fail'],
  ['shifts', 'personId', 'people', 'RESTRICT', 'fail'],
  ['on_call_duties', 'personId', 'people', 'RESTRICT', 'fail'],
  ['handover_notes', 'personId', 'people', 'RESTRICT', 'fail'],
  ['oxygen_cylinders', 'replaceTaskId', 'tasks', 'RESTRICT', 'fail'],
  ['push_subscriptions', 'personId', 'people', 'RESTRICT', 'fail'],
  ['notifications', 'alertId', 'alerts', 'RESTRICT', 'fail'],
  ['notifications', 'personId', 'people', 'RESTRICT', 'fail'],
  ['text_quotas', 'personId', 'people', 'RESTRICT', 'fail'],
]

const keyName = (table: string, column: string) => `FK_${table}_${column}`

/** Foreign keys for every id column whose row must never point at nothing. */
export class ForeignKeys1796560000000 implements MigrationInterface {
  name = 'ForeignKeys1796560000000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    const dangling = new Map<(typeof KEYS)[number], number>()
    for (const key of KEYS) {
      const [table, column, parent] = key
      const [{ count }] = await queryRunner.query(
        `SELECT COUNT(*) AS count FROM \`${table}\` c LEFT JOIN \`${parent}\` p ON p.\`id\` = c.\`${column}\` WHERE c.\`${column}\` IS NOT NULL AND p.\`id\` IS NULL`,
      )
      if (Number(count) > 0) dangling.set(key, Number(count))
    }
    // Every problem is named before anything changes, so a refused run leaves the schema as it was.
    const refused = [...dangling].filter(([[, , , , orphans]]) => orphans === 'fail')
    if (refused.length) {
      const list = refused.map(([[table, column, parent], count]) => `${table}.${column}: ${count} row(s) point at missing ${parent}`).join('; ')
      throw new Error(`Foreign keys not added; repair these rows by hand, then migrate again. ${list}`)
    }
    for (const [[table, column, parent], count] of dangling) {
      await queryRunner.query(
        `UPDATE \`${table}\` c LEFT JOIN \`${parent}\` p ON p.\`id\` = c.\`${column}\` SET c.\`${column}\` = NULL WHERE c.\`${column}\` IS NOT NULL AND p.\`id\` IS NULL`,
      )
      console.log(`${table}.${column}: ${count} row(s) pointed at deleted ${parent}; set to NULL before adding the foreign key.`)
    }
    // One ALTER per table, so a large table is rebuilt once.
    for (const table of new Set(KEYS.map(([t]) => t))) {
      const adds = KEYS.filter(([t]) => t === table).map(
        ([, column, parent, onDelete]) =>
          `ADD CONSTRAINT \`${keyName(table, column)}\` FOREIGN KEY (\`${column}\`) REFERENCES \`${parent}\`(\`id\`) ON DELETE ${onDelete} ON UPDATE RESTRICT`,
      )
      await queryRunner.query(`ALTER TABLE \`${table}\` ${adds.join(', ')}`)
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const [table, column] of [...KEYS].reverse()) {
      const name = keyName(table, column)
      await queryRunner.query(`ALTER TABLE \`${table}\` DROP FOREIGN KEY \`${name}\``)
      // MariaDB added an index of the same name where no index covered the column; it goes too.
      const own = await queryRunner.query(
        'SELECT 1 FROM information_schema.STATISTICS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ? AND INDEX_NAME = ? LIMIT 1',
        [table, name],
      )
      if (own.length) await queryRunner.query(`ALTER TABLE \`${table}\` DROP INDEX \`${name}\``)
    }
  }
}
