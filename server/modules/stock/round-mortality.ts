import type { EntityManager } from 'typeorm'
import type { Band } from '#shared/schemas/parameter'
import { OTHER_CAUSE, RoundMortalityDetailSchema, UNKNOWN_CAUSE, type RoundMortalityDetail } from '#shared/schemas/stock'
import { balances, largestHolder } from '#shared/stock/ledger'
import { periodFigures } from '#shared/stock/period-report'
import { db } from '../../db/data-source'
import { validationError } from '../../lib/errors'
import { NO_DETAILS, writeMovement } from './movement-writer'
import { getStockSettings } from './stock-settings.service'
import { tankCodes } from './stock.service'
import { MovementEntity } from './stock.entities'
import { toEntry } from './stock-lock'

const FIELD = 'readings.mortalities'
const WEEK_MS = 7 * 86_400_000

export interface RoundMortalityPlan {
  batchId: number
  tankId: number
  count: number
  cause: string
  causeText: string | null
  necropsy: boolean
  /** Deaths in the batch over the last 7 days passed the facility's threshold. */
  overThreshold: boolean
  /** These deaths took the batch over the threshold (it was not over before them): an incident is proposed. */
  crossedThreshold: boolean
  weekPct: number
  weekDead: number
  thresholdPct: number
  tankCode: string
}

export interface RoundMortalityAssessment {
  plan: RoundMortalityPlan | null
  band: Band
  notes: string[]
}

/** The batch holding most fish in a tank on the register, with the register's counts. */
async function batchInTank(tankId: number) {
  const rows = await db()
    .getRepository(MovementEntity)
    .find({ where: [{ fromTankId: tankId }, { toTankId: tankId }] })
  return largestHolder(balances(rows.map(toEntry)), tankId)
}

/**
 * Before a round completion is saved: which batch the dead fish come off, whether the
 * register holds that many, and whether the batch's 7-day losses pass the facility's threshold
 * (a watch flag, like a reading out of its band). Refuses (nothing saved) a count the register
 * cannot hold. A tank the register shows empty keeps the count with the readings only.
 */
export async function assessRoundMortality(
  tankId: number | null,
  dead: number | undefined,
  detail: RoundMortalityDetail | undefined,
  at: Date,
): Promise<RoundMortalityAssessment> {
  if (!tankId || !dead) return { plan: null, band: 'ok', notes: [] }
  const d = RoundMortalityDetailSchema.parse(detail ?? {})
  const settings = await getStockSettings()
  if (![UNKNOWN_CAUSE, OTHER_CAUSE, ...settings.mortalityCauses].includes(d.cause))
    throw validationError('Nothing was saved: choose a cause from the list, "unknown" or "other".', { 'mortality.cause': ['Not on the facility’s list'] })
  const code = (await tankCodes()).get(tankId) ?? `tank ${tankId}`
  const where = await batchInTank(tankId)
  if (!where)
    return {
      plan: null,
      band: 'ok',
      notes: [`The stock register shows no fish in ${code}: the ${dead} dead are kept with the readings only. Ask a supervisor to record the arrival.`],
    }
  if (dead > where.onHand) {
    throw validationError(
      `Nothing was saved: the register shows ${where.onHand} fish in ${code}, fewer than ${dead} dead. Check the count, or ask a supervisor to correct the register.`,
      { [FIELD]: [`Only ${where.onHand} on the register here`] },
    )
  }
  const entries = (
    await db()
      .getRepository(MovementEntity)
      .find({ where: { batchId: where.batchId } })
  ).map((m) => ({ ...toEntry(m), occurredAt: m.occurredAt.toISOString() }))
  const [week] = periodFigures(entries, new Date(at.getTime() - WEEK_MS).toISOString(), new Date(at.getTime() + 1).toISOString())
  const atRisk = (week?.opening ?? 0) + (week?.arrived ?? 0)
  const before = week?.died ?? 0
  const pct = (n: number) => (atRisk ? (n / atRisk) * 100 : 0)
  const weekPct = pct(before + dead)
  const overThreshold = weekPct > settings.mortalityWeekPct
  const crossedThreshold = overThreshold && pct(before) <= settings.mortalityWeekPct
  const plan = {
    batchId: where.batchId,
    tankId,
    count: dead,
    cause: d.cause,
    causeText: d.causeText ?? null,
    necropsy: d.necropsy,
    overThreshold,
    crossedThreshold,
    weekPct,
    weekDead: before + dead,
    thresholdPct: settings.mortalityWeekPct,
    tankCode: code,
  }
  const notes = overThreshold ? [`${weekPct.toFixed(1)} % of the batch died in the last 7 days (the facility flags above ${settings.mortalityWeekPct} %).`] : []
  return { plan, band: overThreshold ? 'watch' : 'ok', notes }
}

/** Inside the completion's transaction: the one mortality movement of this completion. */
export async function writeRoundMortality(manager: EntityManager, plan: RoundMortalityPlan, source: { completionId: string; personId: number; at: Date }) {
  const codes = await tankCodes()
  return writeMovement(
    manager,
    {
      ...NO_DETAILS,
      batchId: plan.batchId,
      kind: 'mortality',
      occurredAt: source.at,
      fromTankId: plan.tankId,
      count: plan.count,
      cause: plan.cause,
      causeText: plan.causeText,
      necropsy: plan.necropsy,
      completionId: source.completionId,
      sourceKey: `completion:${source.completionId}`,
      personId: source.personId,
    },
    { field: FIELD, describeTank: (id) => codes.get(id) ?? `tank ${id}` },
  )
}

/**
 * Inside an amendment's transaction: the completion's recorded deaths become the amended
 * count by one correction pointing at the original movement, never a second mortality.
 */
export async function adjustRoundMortality(
  manager: EntityManager,
  a: { completionId: string; amendmentId: number; tankId: number | null; count: number | undefined; reason: string; personId: number; at: Date },
) {
  if (a.count === undefined || !a.tankId) return
  const mine = await manager.getRepository(MovementEntity).find({ where: { completionId: a.completionId }, order: { id: 'ASC' } })
  const original = mine.find((m) => m.kind === 'mortality')
  const codes = await tankCodes()
  const describeTank = (id: number) => codes.get(id) ?? `tank ${id}`
  const common = {
    ...NO_DETAILS,
    personId: a.personId,
    completionId: a.completionId,
    sourceKey: `amendment:${a.amendmentId}`,
    occurredAt: a.at,
  }
  if (!original) {
    if (a.count === 0) return
    const where = await batchInTank(a.tankId)
    if (!where) return
    await writeMovement(
      manager,
      {
        ...common,
        batchId: where.batchId,
        kind: 'mortality',
        fromTankId: a.tankId,
        count: a.count,
        cause: UNKNOWN_CAUSE,
      },
      { field: FIELD, describeTank },
    )
    return
  }
  const recorded = original.count - mine.filter((m) => m.kind === 'correction' && m.correctsId === original.id).reduce((s, m) => s + m.count, 0)
  const delta = recorded - a.count
  if (delta === 0) return
  await writeMovement(
    manager,
    {
      ...common,
      batchId: original.batchId,
      kind: 'correction',
      toTankId: original.fromTankId,
      count: delta,
      reason: `Round record amended: ${a.reason}`,
      correctsId: original.id,
    },
    { field: FIELD, describeTank },
  )
}
