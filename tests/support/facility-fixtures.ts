import { randomUUID } from 'node:crypto'
import { db } from '#server/db/data-source'
import { areas, systems, tanks } from '#server/modules/facility/catalogues'
import { createFacilityIfMissing } from '#server/modules/facility/facility.service'
import { LimitEntity, ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { RoutineEntity } from '#server/modules/routines/routine.entity'
import { RoutineInputSchema, type RoutineData, type RoutineInput } from '#shared/schemas/routine'
import { DEMO_FACILITY } from '#seed/demo-structure'
import { DEMO_PARAMETERS } from '#seed/demo-parameters'

export const uniqueCode = (prefix: string) => `${prefix}-${randomUUID().slice(0, 6)}`

/** The one facility row the test database shares; made once, in the demo's time zone. */
export async function ensureFacilityAndParameters() {
  const facility = await createFacilityIfMissing(DEMO_FACILITY)
  // Every call fills in whatever is missing; the unique keys keep one copy when test files race.
  await db()
    .getRepository(ParameterEntity)
    .createQueryBuilder()
    .insert()
    .values(DEMO_PARAMETERS.map(({ bands: _b, ...p }) => ({ ...p, derived: p.derived ?? false, ladderId: null })))
    .orIgnore()
    .execute()
  await db()
    .getRepository(LimitEntity)
    .createQueryBuilder()
    .insert()
    .values(DEMO_PARAMETERS.filter((p) => p.bands).map((p) => ({ parameterKey: p.key, scope: 'facility' as const, scopeId: 0, ...p.bands! })))
    .orIgnore()
    .execute()
  return facility
}

/** A fresh area with one system and `count` tanks, all with unique codes. */
export async function makeAreaWithTanks(count = 3, opts: { quarantine?: boolean; roundOrder?: number } = {}) {
  const area = await areas.create({
    code: uniqueCode('AR'),
    name: `Area ${randomUUID().slice(0, 4)}`,
    roundOrder: opts.roundOrder ?? 50,
    quarantine: opts.quarantine ?? false,
  })
  const system = await systems.create({ code: uniqueCode('SY'), name: 'Test loop', areaId: area.id, volumeL: 5000, salinitySetpoint: 2 })
  const made = []
  for (let i = 1; i <= count; i++) {
    made.push(
      await tanks.create({ code: uniqueCode(`T${i}`), name: `Tank ${i}`, areaId: area.id, systemId: system.id, volumeL: 1000, kind: 'tank', inUse: true }),
    )
  }
  return { area, system, tanks: made }
}

export function routineInput(overrides: Partial<RoutineInput> = {}): RoutineInput {
  return {
    name: `Routine ${randomUUID().slice(0, 6)}`,
    category: 'welfare',
    targetKind: 'tank',
    targetIds: [],
    rrule: 'FREQ=DAILY',
    dtstart: '2026-01-05T07:30:00',
    requiredReadings: ['do_mgL', 'temp_c'],
    ...overrides,
  }
}

/** A routine as a service takes it: `routineInput` with the schema's defaults filled in. */
export const routineData = (overrides: Partial<RoutineInput> = {}): RoutineData => RoutineInputSchema.parse(routineInput(overrides))

export const routineRow = (id: number) => db().getRepository(RoutineEntity).findOneByOrFail({ id })
