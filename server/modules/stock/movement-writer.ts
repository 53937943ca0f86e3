import type { EntityManager } from 'typeorm'
import type { ParsedMovementInput } from '#shared/schemas/stock'
import { applyMovement, balanceKey, batchHoldings, type LedgerEntry } from '#shared/stock/ledger'
import { validationError } from '../../lib/errors'
import { updateBatchFromRegister } from '../facility/batch-register.service'
import { lockBatchRegister, toEntry } from './stock-lock'
import { MovementEntity, type MovementRow } from './stock.entities'

export interface WriteExtras {
  sourceKey?: string | null
  completionId?: string | null
  /** Field the refusal is reported on (the round reports it on its mortality reading). */
  field?: string
  describeTank?: (tankId: number) => string
}

/** A movement's columns that only some kinds fill, all empty; each kind fills its own. */
export const NO_DETAILS = {
  fromTankId: null,
  toTankId: null,
  meanWeightG: null,
  origin: null,
  permitRef: null,
  healthCertificateRef: null,
  transportWater: null,
  destination: null,
  reason: null,
  cause: null,
  causeText: null,
  necropsy: false,
  correctsId: null,
  completionId: null,
  sourceKey: null,
  note: null,
} satisfies Partial<MovementRow>

/** The row a parsed movement input becomes (a correction's tank and signed change go in toTankId and count). */
export function rowFor(input: ParsedMovementInput, personId: number): Omit<MovementRow, 'id' | 'createdAt'> {
  const common = {
    ...NO_DETAILS,
    batchId: input.batchId,
    kind: input.kind,
    occurredAt: input.occurredAt ? new Date(input.occurredAt) : new Date(),
    note: input.note ?? null,
    personId,
  }
  switch (input.kind) {
    case 'arrival':
      return {
        ...common,
        toTankId: input.toTankId,
        count: input.count,
        meanWeightG: input.meanWeightG ?? null,
        origin: input.origin,
        permitRef: input.permitRef ?? null,
        healthCertificateRef: input.healthCertificateRef ?? null,
        transportWater: input.transportWater ?? null,
      }
    case 'transfer':
    case 'grading':
      return { ...common, fromTankId: input.fromTankId, toTankId: input.toTankId, count: input.count, meanWeightG: input.meanWeightG ?? null }
    case 'mortality':
      return { ...common, fromTankId: input.fromTankId, count: input.count, cause: input.cause, causeText: input.causeText ?? null, necropsy: input.necropsy }
    case 'cull':
    case 'sampling':
      return { ...common, fromTankId: input.fromTankId, count: input.count, reason: input.reason }
    case 'dispatch':
      return { ...common, fromTankId: input.fromTankId, count: input.count, destination: input.destination }
    case 'correction':
      return { ...common, toTankId: input.tankId, count: input.delta, reason: input.reason, correctsId: input.correctsId ?? null }
  }
}

/**
 * Adds one movement inside the caller's transaction: the batch's register is locked, the
 * movement is refused (nothing written) when it would take a tank's count below zero, and the
 * batch's figures are brought up to date.
 */
export async function writeMovement(manager: EntityManager, row: Omit<MovementRow, 'id' | 'createdAt'>, extras: WriteExtras = {}): Promise<MovementRow> {
  const { rows, onHand } = await lockBatchRegister(manager, row.batchId)
  if (row.correctsId && !rows.some((r) => r.id === row.correctsId))
    throw validationError('The movement it corrects is not on this batch.', { correctsId: ['Choose a movement of this batch'] })
  const entry: LedgerEntry = { ...row, id: undefined }
  const short = applyMovement(onHand, entry)
  if (short) {
    const where = extras.describeTank?.(short.tankId) ?? `tank ${short.tankId}`
    const message = `Nothing was saved: the register shows ${short.onHand} fish of this batch in ${where}, so ${short.wanted} cannot be taken off. Check the count, or ask a supervisor to correct the register.`
    throw validationError(message, { [extras.field ?? (row.kind === 'correction' ? 'delta' : 'count')]: [`Only ${short.onHand} on the register here`] })
  }
  const saved = await manager
    .getRepository(MovementEntity)
    .save({ ...row, sourceKey: extras.sourceKey ?? row.sourceKey, completionId: extras.completionId ?? row.completionId })
  const { count, tankIds } = batchHoldings(onHand, row.batchId)
  await updateBatchFromRegister(manager, row.batchId, count, tankIds)
  return saved
}

export const onHandIn = (onHand: Map<string, number>, batchId: number, tankId: number) => onHand.get(balanceKey(batchId, tankId)) ?? 0
export { toEntry }
