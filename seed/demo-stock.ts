import { DateTime } from 'luxon'
import { db } from '#server/db/data-source'
import { updateBatchFromRegister } from '#server/modules/facility/batch-register.service'
import { NO_DETAILS } from '#server/modules/stock/movement-writer'
import { MovementEntity, type MovementRow } from '#server/modules/stock/stock.entities'
import { UNKNOWN_CAUSE } from '#shared/schemas/stock'
import { applyMovement, balanceKey, batchHoldings, largestHolder, type LedgerEntry } from '#shared/stock/ledger'
import { DEMO_STOCK_STORY, type StoryMovement } from './demo-stock-story'

type NewMovement = Omit<MovementRow, 'id' | 'createdAt'>
interface Ids {
  tanks: Map<string, number>
  batches: Map<string, number>
  /** Who records what: the supervisor moves stock, a technician removes the dead, the manager signs dispatches. */
  supervisor: number
  technician: number
  manager: number
}

/**
 * Writes the demo's year of stock movements, then the deaths the fortnight of round history
 * recorded (one mortality movement per completion, as the round writes them), and brings each
 * batch's count and tanks up to date from the register. Every movement is checked in date order
 * against the running count; the story refuses to write a year that does not balance.
 */
export async function seedStock(zone: string, ids: Ids): Promise<number> {
  const today = DateTime.now().setZone(zone).startOf('day')
  const when = (m: StoryMovement) => {
    const [hour, minute] = m.time.split(':').map(Number)
    return today.minus({ days: m.daysAgo }).set({ hour, minute }).toJSDate()
  }
  const tank = (code: string | undefined) => (code ? ids.tanks.get(code)! : null)
  const planned: Array<{ at: Date; story?: StoryMovement; round?: { completionId: string; tankId: number; dead: number; personId: number } }> =
    DEMO_STOCK_STORY.map((story) => ({ at: when(story), story }))
  const roundDeaths: Array<{ completionId: string; tankId: number; value: number; takenAt: Date; personId: number }> = await db().query(
    "SELECT completionId, tankId, value, takenAt, personId FROM readings WHERE parameterKey = 'mortalities' AND value > 0 AND tankId IS NOT NULL AND supersededAt IS NULL",
  )
  for (const r of roundDeaths)
    planned.push({
      at: new Date(r.takenAt),
      round: { completionId: r.completionId, tankId: Number(r.tankId), dead: Number(r.value), personId: Number(r.personId) },
    })
  planned.sort((a, b) => a.at.getTime() - b.at.getTime())

  const onHand = new Map<string, number>()
  const rows: NewMovement[] = []
  for (const p of planned) {
    let row: NewMovement
    if (p.round) {
      // A death on the round in a tank the register shows empty stays with the readings only, as in the app.
      const holder = largestHolder(onHand, p.round.tankId)
      if (!holder || holder.onHand < p.round.dead) continue
      row = {
        ...NO_DETAILS,
        batchId: holder.batchId,
        kind: 'mortality',
        occurredAt: p.at,
        fromTankId: p.round.tankId,
        count: p.round.dead,
        cause: UNKNOWN_CAUSE,
        completionId: p.round.completionId,
        sourceKey: `completion:${p.round.completionId}`,
        personId: p.round.personId,
      }
    } else {
      const s = p.story!
      const batchId = ids.batches.get(s.batch)!
      const count = s.count === 'rest' ? (onHand.get(balanceKey(batchId, tank(s.from)!)) ?? 0) : s.count
      const personId = s.kind === 'mortality' ? ids.technician : s.kind === 'dispatch' ? ids.manager : ids.supervisor
      row = {
        ...NO_DETAILS,
        batchId,
        kind: s.kind,
        occurredAt: p.at,
        fromTankId: tank(s.from),
        toTankId: tank(s.to),
        count,
        meanWeightG: s.meanWeightG ?? null,
        origin: s.origin ?? null,
        permitRef: s.permitRef ?? null,
        healthCertificateRef: s.healthCertificateRef ?? null,
        transportWater: s.transportWater ?? null,
        destination: s.destination ?? null,
        reason: s.reason ?? null,
        cause: s.cause ?? null,
        necropsy: s.necropsy ?? false,
        note: s.note ?? null,
        personId,
      }
      if (count === 0) continue
    }
    const short = applyMovement(onHand, row as LedgerEntry)
    if (short)
      throw new Error(
        `Demo stock story does not balance: ${row.kind} of ${row.count} on ${row.occurredAt.toISOString()} finds ${short.onHand} in tank ${short.tankId}`,
      )
    rows.push(row)
  }
  for (let i = 0; i < rows.length; i += 500)
    await db()
      .getRepository(MovementEntity)
      .insert(rows.slice(i, i + 500))

  for (const [, batchId] of ids.batches) {
    const { count, tankIds } = batchHoldings(onHand, batchId)
    await updateBatchFromRegister(db(), batchId, count, tankIds)
  }
  return rows.length
}
