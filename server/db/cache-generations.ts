import { EventSubscriber } from 'typeorm'
import type { EntitySubscriberInterface, InsertEvent, QueryRunner, RemoveEvent, TransactionCommitEvent, TransactionRollbackEvent, UpdateEvent } from 'typeorm'

/**
 * What the process keeps copies of (record 16e), by the tables whose writes make a copy stale:
 * the facility and its catalogues, parameters and limits, and people (their names on cards).
 */
export type CachedKind = 'catalogue' | 'parameters' | 'people'

const KIND_OF_TABLE: Record<string, CachedKind> = {
  facilities: 'catalogue',
  areas: 'catalogue',
  systems: 'catalogue',
  tanks: 'catalogue',
  equipment: 'catalogue',
  batches: 'catalogue',
  parameters: 'parameters',
  limits: 'parameters',
  people: 'people',
}

const generations = new Map<CachedKind, number>()
/** Kinds written inside a transaction still open: invalidated again once it ends. */
const openWrites = new WeakMap<QueryRunner, Set<CachedKind>>()

/** Whether writes to this table make a copy stale: such writes must go through TypeORM, which the invalidator sees. */
export const isCachedTable = (tableName: string) => tableName in KIND_OF_TABLE

export const generationOf = (kind: CachedKind) => generations.get(kind) ?? 0

export function invalidate(kind: CachedKind) {
  generations.set(kind, generationOf(kind) + 1)
}

export function invalidateAll() {
  for (const kind of new Set(Object.values(KIND_OF_TABLE))) invalidate(kind)
}

/** Whether this transaction wrote rows of that kind (its copy would miss them, or keep them after a rollback). */
export const wroteInTransaction = (runner: QueryRunner | undefined, kind: CachedKind) => !!runner && !!openWrites.get(runner)?.has(kind)

function noteWrite(tableName: string, runner: QueryRunner) {
  const kind = KIND_OF_TABLE[tableName]
  if (!kind) return
  // At once, so a copy being loaded meanwhile is not kept; again when the transaction ends, so a
  // copy loaded between the write and the commit (without the change) is not kept either.
  invalidate(kind)
  if (!runner.isTransactionActive) return
  const kinds = openWrites.get(runner) ?? new Set<CachedKind>()
  kinds.add(kind)
  openWrites.set(runner, kinds)
}

function transactionEnded(runner: QueryRunner) {
  // A savepoint released or rolled back: the transaction itself goes on.
  if (runner.isTransactionActive) return
  const kinds = openWrites.get(runner)
  if (!kinds) return
  openWrites.delete(runner)
  kinds.forEach(invalidate)
}

/**
 * Sees every write TypeORM makes in this process (repositories and query builders; raw SQL is not
 * seen, and no code writes these tables that way) and makes the copies of that kind stale.
 */
export class CacheInvalidator implements EntitySubscriberInterface {
  afterInsert(event: InsertEvent<unknown>) {
    noteWrite(event.metadata.tableName, event.queryRunner)
  }
  afterUpdate(event: UpdateEvent<unknown>) {
    noteWrite(event.metadata.tableName, event.queryRunner)
  }
  afterRemove(event: RemoveEvent<unknown>) {
    noteWrite(event.metadata.tableName, event.queryRunner)
  }
  afterTransactionCommit(event: TransactionCommitEvent) {
    transactionEnded(event.queryRunner)
  }
  afterTransactionRollback(event: TransactionRollbackEvent) {
    transactionEnded(event.queryRunner)
  }
}
// Registered as TypeORM's decorator would, without decorator syntax (record 001).
EventSubscriber()(CacheInvalidator)
