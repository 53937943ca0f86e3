import { DefaultNamingStrategy, type Table } from 'typeorm'

/**
 * A foreign key on an id column (record 13f). The target is the entity's name, not its schema,
 * so a module never imports another module's entity file. RESTRICT unless the app really deletes
 * the parent; both rules are spelt out because MariaDB reports RESTRICT for an unnamed rule and
 * TypeORM's own default (NO ACTION) would make every generated migration re-create the key.
 */
export const references = (target: string, onDelete: 'RESTRICT' | 'SET NULL' | 'CASCADE' = 'RESTRICT') => ({ target, onDelete, onUpdate: 'RESTRICT' }) as const

/** Readable key names (`FK_tasks_assigneeId`), the ones migration 1796560000000 creates, instead of TypeORM's hashes. */
export class RoundtideNamingStrategy extends DefaultNamingStrategy {
  override foreignKeyName(tableOrName: Table | string, columnNames: string[]): string {
    return `FK_${this.getTableName(tableOrName)}_${columnNames.join('_')}`
  }
}
