import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import { db } from '#server/db/data-source'
import { subscribeModules } from '#server/module-subscriptions'
import { areas, systems, tanks } from '#server/modules/facility/catalogues'
import { PersonEntity } from '#server/modules/people/person.entity'
import { hashPassword } from '#server/modules/people/people.service'
import { RoutineEntity } from '#server/modules/routines/routine.entity'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import type { Tank } from '#shared/schemas/facility'
import type { Role } from '#shared/schemas/person'
import { RoutineInputSchema, type RoutineInput } from '#shared/schemas/routine'
import { TEST_PASSWORD } from '#seed/factories'
import { ensureFacilityAndParameters } from '#tests/support/facility-fixtures'
import { log } from './stats'

export const BENCH_PASSWORD = TEST_PASSWORD
export const AREA_COUNT = 8
/** ROUNDTIDE_BENCH_TANKS (200 by default) sets the facility's size for the growth table; tasks a day grow with it (30 per tank). */
export const TANKS_PER_AREA = Math.max(1, Math.round(Number(process.env.ROUNDTIDE_BENCH_TANKS || 200) / 8))
export const SYSTEM_COUNT = 6
export const ROUND_SIZE = 24

export interface BenchPerson {
  id: number
  email: string
  role: Role
}

export interface BenchFacility {
  zone: string
  tanks: Tank[]
  people: BenchPerson[]
  supervisor: BenchPerson
  /** The technician whose morning round the browser journey walks; owns no routine. */
  roundTechnician: BenchPerson
}

/** 30 people with one bcrypt hash between them: hashing 30 times would only time bcrypt. */
async function makePeople(): Promise<BenchPerson[]> {
  const roles: Role[] = ['manager', ...Array<Role>(3).fill('supervisor'), ...Array<Role>(24).fill('technician'), 'observer', 'observer']
  const passwordHash = await hashPassword(BENCH_PASSWORD)
  const tag = randomUUID().slice(0, 6)
  const rows = roles.map((role, i) => ({
    email: `bench-${i + 1}-${tag}@roundtide.example`,
    name: `Bench ${role} ${i + 1}`,
    title: null,
    phone: null,
    role,
    passwordHash,
    active: true,
    onCallEligible: role !== 'observer',
    sessionVersion: 0,
    quietStart: null,
    quietEnd: null,
  }))
  await db().getRepository(PersonEntity).insert(rows)
  const saved = await db()
    .getRepository(PersonEntity)
    .find({ order: { id: 'ASC' } })
  return saved.map((p) => ({ id: p.id, email: p.email, role: p.role }))
}

/**
 * 60 routines making exactly 6,000 tasks a day: 20 four-times-daily feeds on one area (25 tanks),
 * 20 twice-daily DO and temperature checks on two areas, 20 daily hygiene checks on four areas.
 */
function routineInputs(areaIds: number[], owners: number[]): RoutineInput[] {
  const pick = (start: number, n: number) => Array.from({ length: n }, (_, k) => areaIds[(start + k) % areaIds.length])
  return Array.from({ length: 60 }, (_, i) => {
    const group = Math.floor(i / 20)
    const common = {
      targetKind: 'area_tanks' as const,
      dtstart: '2026-01-05T07:00:00',
      assigneeRule: { kind: 'person' as const, personId: owners[i % owners.length] },
    }
    if (group === 0)
      return {
        ...common,
        name: `Feed ${i + 1}`,
        category: 'feeding',
        targetIds: pick(i, 1),
        rrule: 'FREQ=DAILY;BYHOUR=7,11,15,19;BYMINUTE=0',
        durationMinutes: 2,
      }
    if (group === 1) {
      return {
        ...common,
        name: `Water check ${i + 1}`,
        category: 'welfare',
        targetIds: pick(i, 2),
        rrule: 'FREQ=DAILY;BYHOUR=8,14;BYMINUTE=30',
        requiredReadings: ['do_mgL', 'temp_c'],
        priority: 'welfare_critical',
      }
    }
    return { ...common, name: `Hygiene ${i + 1}`, category: 'hygiene', targetIds: pick(i, 4), rrule: 'FREQ=DAILY;BYHOUR=10;BYMINUTE=15', durationMinutes: 4 }
  })
}

/** The large facility, built through the catalogue services; routines inserted without materialising. */
export async function buildSyntheticFacility(): Promise<BenchFacility> {
  // A tank created in use is planned through scheduling, as in the app.
  subscribeModules()
  const facility = await ensureFacilityAndParameters()
  const madeAreas = []
  for (let a = 0; a < AREA_COUNT; a++) {
    madeAreas.push(await areas.create({ code: `BA${a + 1}`, name: `Bench hall ${a + 1}`, roundOrder: (a + 1) * 10, quarantine: a === AREA_COUNT - 1 }))
  }
  const madeSystems = []
  for (let s = 0; s < SYSTEM_COUNT; s++) {
    madeSystems.push(await systems.create({ code: `BS${s + 1}`, name: `Loop ${s + 1}`, areaId: madeAreas[s].id, volumeL: 20000, salinitySetpoint: 2 }))
  }
  const madeTanks: Tank[] = []
  for (const [a, area] of madeAreas.entries()) {
    for (let t = 1; t <= TANKS_PER_AREA; t++) {
      const code = `B${a + 1}-${String(t).padStart(3, '0')}`
      madeTanks.push(
        await tanks.create({
          code,
          name: `Tank ${code}`,
          areaId: area.id,
          systemId: madeSystems[a % SYSTEM_COUNT].id,
          volumeL: 1200,
          kind: 'tank',
          inUse: true,
        }),
      )
    }
  }
  log(`facility: ${madeAreas.length} areas, ${madeSystems.length} systems, ${madeTanks.length} tanks`)
  const people = await makePeople()
  const technicians = people.filter((p) => p.role === 'technician')
  const roundTechnician = technicians[0]
  const owners = technicians.slice(1).map((p) => p.id)
  const repo = db().getRepository(RoutineEntity)
  const inputs = routineInputs(
    madeAreas.map((a) => a.id),
    owners,
  ).map((r) => ({ ...RoutineInputSchema.parse(r), version: 1 }))
  await repo.save(inputs.map((r) => repo.create(r)))
  log(`people: ${people.length}; routines: ${inputs.length}`)
  return { zone: facility.timeZone, tanks: madeTanks, people, supervisor: people.find((p) => p.role === 'supervisor')!, roundTechnician }
}

/** Today's morning round for one technician: one DO + temperature task on each of 24 tanks of the first hall. */
export async function arrangeMorningRound(f: BenchFacility): Promise<number[]> {
  const now = DateTime.now().setZone(f.zone)
  // Due soon but still on the facility's today, even when the bench runs just before midnight there.
  const base = DateTime.min(now.plus({ minutes: 10 }), now.endOf('day').minus({ minutes: 60 }))
  const repo = db().getRepository(TaskEntity)
  const rows = f.tanks.slice(0, ROUND_SIZE).map((tank, i) => {
    const due = base.plus({ seconds: i * 20 })
    const local = due.toFormat("yyyy-MM-dd'T'HH:mm:ss")
    return repo.create({
      routineId: null,
      eventId: null,
      title: 'Morning water check',
      category: 'welfare',
      instructions: 'Read DO and temperature at the outlet.',
      priority: 'welfare_critical',
      targetKind: 'tank',
      targetId: tank.id,
      tankId: tank.id,
      areaId: tank.areaId,
      localDate: due.toISODate()!,
      localStart: local,
      occurrenceStart: local,
      dueAt: due.toJSDate(),
      windowStartAt: due.minus({ minutes: 30 }).toJSDate(),
      graceUntil: due.plus({ minutes: 60 }).toJSDate(),
      durationMinutes: 3,
      status: 'open',
      assigneeId: f.roundTechnician.id,
      assignedManually: true,
      edited: false,
      requiredReadings: ['do_mgL', 'temp_c'],
      version: 1,
    })
  })
  return (await repo.save(rows)).map((r) => r.id)
}
