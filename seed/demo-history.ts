import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import { In, LessThan } from 'typeorm'
import { bandFor, pickLimit, worstBand } from '#shared/readings/band'
import { deriveReadings } from '#shared/readings/derive'
import type { Band } from '#shared/schemas/parameter'
import { db } from '#server/db/data-source'
import { CompletionEntity, ReadingEntity, type CompletionRow } from '#server/modules/completions/completion.entities'
import { LimitEntity, ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { loadCatalogue } from '#server/modules/tasks/targets'

/** A small seeded generator, so every fresh demo tells the same (invented) story. */
export function generator(seed: number) {
  let a = seed
  const next = () => {
    a |= 0
    a = (a + 0x6d2b79f5) | 0
    let t = Math.imul(a ^ (a >>> 15), 1 | a)
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
  return { next, around: (mean: number, spread: number) => mean + (next() + next() + next() - 1.5) * spread }
}

/** Invented but plausible values for a warm-water RAS; a few drift out of range on purpose. */
function fakeValue(key: string, r: ReturnType<typeof generator>, salinity: number): number {
  const round = (v: number, d: number) => Math.round(v * 10 ** d) / 10 ** d
  switch (key) {
    case 'temp_c':
      return round(r.around(28.6, 0.9), 1)
    case 'do_mgL':
      return round(r.next() < 0.03 ? r.around(4.4, 0.6) : r.around(6.9, 0.9), 1)
    // About one check in twenty finds a dead fish: the round's deaths go on the stock register too.
    case 'mortalities':
      return r.next() < 0.85 ? 0 : r.next() < 0.3 ? 1 + Math.floor(r.next() * 2) : 0
    case 'behaviour_score':
      return r.next() < 0.9 ? 0 : 1
    case 'feed_g':
      return round(r.around(120, 40), 0)
    case 'uneaten_feed_g':
      return round(r.around(3, 2) + 2, 1)
    case 'salinity':
      return round(r.around(salinity, 0.8), 1)
    case 'tan_mgL':
      return round(Math.max(0.05, r.around(0.35, 0.3)), 2)
    case 'no2_mgL':
      return round(Math.max(0.02, r.around(0.18, 0.15)), 2)
    case 'ph':
      return round(r.around(7.6, 0.2), 2)
    case 'no3_mgL':
      return round(r.around(45, 15), 0)
    case 'alkalinity_mgL':
      return round(r.around(150, 30), 0)
    case 'co2_mgL':
      return round(r.around(10, 4), 1)
    case 'cylinder_bar':
      return round(r.around(150, 40), 0)
    default:
      return 0
  }
}

/**
 * The fortnight before today as if the station had used Roundtide: most checks done with
 * readings (a few late, a few flagged), a few missed or skipped, so trends and reports have data.
 */
export async function seedHistory(days: number, zone: string): Promise<number> {
  const r = generator(20261202)
  const start = DateTime.now().setZone(zone).startOf('day').minus({ days })
  // Today is left for the person trying the demo: its round is theirs to walk.
  const cutoff = DateTime.now().setZone(zone).startOf('day').toJSDate()
  const [cat, parameters, limits] = await Promise.all([loadCatalogue(), db().getRepository(ParameterEntity).find(), db().getRepository(LimitEntity).find()])
  const units = new Map(parameters.map((p) => [p.key, p.unit]))
  const fallbackDoer = (await db().query("SELECT id FROM people WHERE role = 'technician' ORDER BY id LIMIT 1"))[0]?.id as number
  const tasks = await db()
    .getRepository(TaskEntity)
    .find({ where: { dueAt: LessThan(cutoff), status: In(['planned', 'open', 'overdue']) } })
  const past = tasks.filter((t) => t.dueAt >= start.toJSDate())
  const completions: Array<Partial<CompletionRow>> = []
  const readings: Array<Record<string, unknown>> = []
  for (const task of past) {
    const roll = r.next()
    if (roll < 0.03) {
      await db().getRepository(TaskEntity).update(task.id, { status: 'missed' })
      continue
    }
    const person = task.assigneeId ?? fallbackDoer
    if (roll < 0.04) {
      const id = randomUUID()
      completions.push({
        id,
        taskId: task.id,
        personId: person,
        outcome: 'skipped',
        skipReason: 'equipment_fault',
        note: 'Handheld meter flat; read at the next check',
        doneAt: task.dueAt,
        lateMinutes: null,
        enteredById: null,
        response: null,
      })
      await db().getRepository(TaskEntity).update(task.id, { status: 'skipped', completedAt: task.dueAt, completedById: person })
      continue
    }
    const doneAt = new Date(task.dueAt.getTime() + Math.round(r.around(5, 30)) * 60_000)
    const late = doneAt > task.dueAt ? Math.floor((doneAt.getTime() - task.dueAt.getTime()) / 60_000) : null
    const tank = task.tankId ? cat.tanks.get(task.tankId) : undefined
    const systemId = task.targetKind === 'system' ? task.targetId : (tank?.systemId ?? null)
    const salinity = systemId ? (cat.systems.get(systemId)?.salinitySetpoint ?? 0) : 0
    const where = { systemId, batchIds: [...cat.batches.values()].filter((b) => tank && b.tankIds.includes(tank.id)).map((b) => b.id) }
    const values = Object.fromEntries(task.requiredReadings.map((k) => [k, fakeValue(k, r, salinity)]))
    const derived = deriveReadings(values, salinity).values
    const bands: Band[] = []
    const id = randomUUID()
    for (const [key, value, isDerived] of [
      ...Object.entries(values).map(([k, v]) => [k, v, false] as const),
      ...Object.entries(derived).map(([k, v]) => [k, v, true] as const),
    ]) {
      const band = bandFor(value, pickLimit(limits, key, where))
      bands.push(band)
      readings.push({
        completionId: id,
        taskId: task.id,
        tankId: tank?.id ?? null,
        systemId,
        parameterKey: key,
        value,
        unit: units.get(key) ?? '',
        band,
        derived: isDerived,
        takenAt: doneAt,
        personId: person,
        supersededAt: null,
        amendmentId: null,
      })
    }
    const flag = worstBand(bands)
    completions.push({
      id,
      taskId: task.id,
      personId: person,
      outcome: 'done',
      skipReason: null,
      note: null,
      doneAt,
      lateMinutes: late,
      enteredById: null,
      response: null,
    })
    await db()
      .getRepository(TaskEntity)
      .update(task.id, { status: 'done', completedAt: doneAt, completedById: person, lateMinutes: late, flag: flag === 'ok' ? null : flag, assigneeId: person })
  }
  for (let i = 0; i < completions.length; i += 500)
    await db()
      .getRepository(CompletionEntity)
      .insert(completions.slice(i, i + 500) as never)
  for (let i = 0; i < readings.length; i += 1000)
    await db()
      .getRepository(ReadingEntity)
      .insert(readings.slice(i, i + 1000) as never)
  return completions.length
}
