import { DateTime } from 'luxon'
import { db } from '#server/db/data-source'
import { AreaEntity, BatchEntity, EquipmentEntity, SystemEntity, TankEntity } from '#server/modules/facility/facility.entities'
import { createLadder } from '#server/modules/escalation/ladders.service'
import { createFacilityIfMissing, updateFacility } from '#server/modules/facility/facility.service'
import { LimitEntity, ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { createPerson, getPersonRow } from '#server/modules/people/people.service'
import { createCylinder, recordCylinderReading } from '#server/modules/oxygen/oxygen.service'
import { CylinderInputSchema } from '#shared/schemas/oxygen'
import { startEvent } from '#server/modules/playbooks/events.service'
import { createPlaybook } from '#server/modules/playbooks/playbooks.service'
import { tanks as tanksCatalogue } from '#server/modules/facility/catalogues'
import { applyShiftPattern } from '#server/modules/roster/roster.service'
import { generateRotation } from '#server/modules/roster/rotation.service'
import { RoutineEntity } from '#server/modules/routines/routine.entity'
import { materialise } from '#server/modules/scheduling/materialiser'
import { subscribeModules } from '#server/module-subscriptions'
import { EventInputSchema, PlaybookInputSchema } from '#shared/schemas/playbook'
import type { AssigneeRule } from '#shared/schemas/routine'
import { DEMO_PEOPLE } from './demo-people'
import { DEMO_BATCH_LIMITS, DEMO_PARAMETERS, DEMO_SYSTEM_LIMITS } from './demo-parameters'
import { DEMO_CYLINDERS, DEMO_PLAYBOOKS } from './demo-playbooks'
import { seedHistory } from './demo-history'
import { seedIncidents } from './demo-incidents'
import { seedStock } from './demo-stock'
import { DEMO_ON_CALL, DEMO_SHIFT_PATTERNS } from './demo-roster'
import { DEMO_ROUTINES } from './demo-routines'
import { DEMO_AREAS, DEMO_BATCHES, DEMO_EQUIPMENT, DEMO_FACILITY, DEMO_SYSTEMS, DEMO_TANKS } from './demo-structure'
import { buildPersonInput } from './factories'

const NURSERY_CODES = ['NUR-T01', 'NUR-T02', 'NUR-T03', 'NUR-T04', 'NUR-T05', 'NUR-T06']
const idsByCode = <T extends { id: number; code: string }>(rows: T[]) => new Map(rows.map((r) => [r.code, r.id]))

/** Loads the invented demo facility into an empty, migrated database, anchored on today. */
export async function seedDemo(demoPassword: string, log: (line: string) => void = console.log) {
  // Filling tanks plans their tasks through scheduling, as in the app.
  subscribeModules()
  const people = new Map<string, number>()
  for (const person of DEMO_PEOPLE) {
    people.set(person.email, (await createPerson(buildPersonInput({ ...person, password: demoPassword }))).id)
  }
  const facility = await createFacilityIfMissing(DEMO_FACILITY)
  const today = DateTime.now().setZone(facility.timeZone).startOf('day')

  const areas = idsByCode(await db().getRepository(AreaEntity).save(DEMO_AREAS))
  const systems = idsByCode(
    await db()
      .getRepository(SystemEntity)
      .save(DEMO_SYSTEMS.map(({ area, ...s }) => ({ ...s, areaId: areas.get(area)! }))),
  )
  const tanks = idsByCode(
    await db()
      .getRepository(TankEntity)
      .save(DEMO_TANKS.map(({ area, system, ...t }) => ({ ...t, areaId: areas.get(area)!, systemId: systems.get(system)! }))),
  )
  const equipment = idsByCode(
    await db()
      .getRepository(EquipmentEntity)
      .save(DEMO_EQUIPMENT.map(({ area, ...e }) => ({ ...e, areaId: areas.get(area)! }))),
  )
  const batches = idsByCode(
    await db()
      .getRepository(BatchEntity)
      .save(
        DEMO_BATCHES.map(({ daysAgo, tanks: codes, ...batch }) => ({
          ...batch,
          arrivalDate: today.minus({ days: daysAgo }).toISODate()!,
          tankIds: codes.map((c) => tanks.get(c)!),
        })),
      ),
  )

  await db()
    .getRepository(ParameterEntity)
    .save(DEMO_PARAMETERS.map(({ bands: _b, ...p }) => ({ ...p, derived: p.derived ?? false })))
  await db()
    .getRepository(LimitEntity)
    .save([
      ...DEMO_PARAMETERS.filter((p) => p.bands).map((p) => ({ parameterKey: p.key, scope: 'facility' as const, scopeId: null, ...p.bands! })),
      ...DEMO_SYSTEM_LIMITS.map((l) => ({ parameterKey: l.key, scope: 'system' as const, scopeId: systems.get(l.system)!, ...l.bands })),
      ...DEMO_BATCH_LIMITS.map((l) => ({ parameterKey: l.key, scope: 'batch' as const, scopeId: batches.get(l.batch)!, ...l.bands })),
    ])

  const rosterFrom = today.minus({ weeks: 2 }).startOf('week')
  for (const { email, ...pattern } of DEMO_SHIFT_PATTERNS) {
    await applyShiftPattern({ ...pattern, personId: people.get(email)!, from: rosterFrom.toISODate()!, to: today.plus({ weeks: 8 }).toISODate()! })
  }
  await generateRotation({ personIds: DEMO_ON_CALL.map((e) => people.get(e)!), from: rosterFrom.toISODate()!, weeks: 11 })

  // The station's ladders: a standard one for routine work, a fast one for welfare-critical
  // checks and critical readings; the welfare officer hears of anything still open after an hour.
  const ruth = people.get('ruth.amsel@brackenwater.example')!
  const standard = await createLadder({
    name: 'Standard',
    steps: [
      { afterMinutes: 0, notify: [{ kind: 'assignee' }] },
      { afterMinutes: 30, notify: [{ kind: 'on_call' }] },
      { afterMinutes: 120, notify: [{ kind: 'managers' }] },
    ],
  })
  const fast = await createLadder({
    name: 'Fast (welfare-critical)',
    steps: [
      { afterMinutes: 0, notify: [{ kind: 'assignee' }] },
      { afterMinutes: 15, notify: [{ kind: 'on_call' }, { kind: 'on_shift' }] },
      { afterMinutes: 45, notify: [{ kind: 'managers' }] },
      { afterMinutes: 60, notify: [{ kind: 'person', personId: ruth }] },
    ],
  })
  await updateFacility({ defaultLadderId: standard.id, fastLadderId: fast.id })

  const lookup: Record<string, Map<string, number>> = { tank: tanks, system: systems, equipment, area: areas, area_tanks: areas, batch: batches }
  const anchor = today.minus({ weeks: 8 }).toISODate()
  await db()
    .getRepository(RoutineEntity)
    .save(
      DEMO_ROUTINES.map((r) => ({
        name: r.name,
        category: r.category,
        instructions: r.instructions,
        targetKind: r.targetKind,
        targetIds: r.targets.map((code) => lookup[r.targetKind].get(code)!),
        onlyInUse: r.onlyInUse ?? true,
        rrule: r.rrule,
        dtstart: `${anchor}T${r.time}:00`,
        durationMinutes: r.durationMinutes,
        windowBeforeMinutes: 30,
        graceMinutes: r.graceMinutes,
        priority: r.welfareCritical ? ('welfare_critical' as const) : ('routine' as const),
        assigneeRule: (r.assignee.kind === 'named' ? { kind: 'person', personId: people.get(r.assignee.email)! } : r.assignee) as AssigneeRule,
        requiredReadings: r.readings,
        activeFrom: null,
        activeTo: null,
        paused: false,
        skipDates: [],
        ladderId: null,
        version: 1,
      })),
    )
  const playbooks = []
  for (const p of DEMO_PLAYBOOKS) playbooks.push(await createPlaybook(PlaybookInputSchema.parse(p)))
  for (const c of DEMO_CYLINDERS) await createCylinder(CylinderInputSchema.parse(c))
  const manager = { ...(await getPersonRow(people.get('maren.holloway@brackenwater.example')!)), createdAt: '' } as never

  // Two weeks of history, then today from its start, so the morning's round is there whenever it is run.
  const { created } = await materialise({ from: today.minus({ days: 14 }).toJSDate(), horizonDays: 14 + 42 })
  const history = await seedHistory(14, facility.timeZone)
  const person = (email: string) => ({ id: people.get(email)!, name: DEMO_PEOPLE.find((p) => p.email === email)!.name })
  const [supervisor, technician, boss, vet] = ['tomas.ferreira', 'priya.nandakumar', 'maren.holloway', 'ruth.amsel'].map((n) =>
    person(`${n}@brackenwater.example`),
  )
  const movements = await seedStock(facility.timeZone, { tanks, batches, supervisor: supervisor.id, technician: technician.id, manager: boss.id })
  await seedIncidents(facility.timeZone, { tanks, batches, supervisor, manager: boss, welfareOfficer: vet })
  // Coming up: an arrival into quarantine in three days, and a nursery grading (with its fasting window) in five.
  const spareBins = ['QUA-B03', 'QUA-B04'].map((c) => tanks.get(c)!)
  await tanksCatalogue.update(spareBins[0], { inUse: true })
  await tanksCatalogue.update(spareBins[1], { inUse: true })
  await startEvent(
    EventInputSchema.parse({
      playbookId: playbooks[0].id,
      title: 'Arrival of juveniles from Tallowmere',
      localStart: `${today.plus({ days: 3 }).toISODate()}T09:30`,
      tankIds: spareBins,
      notes: 'Veterinarian on site that morning.',
    }),
    manager,
  )
  await startEvent(
    EventInputSchema.parse({
      playbookId: playbooks[1].id,
      title: 'Nursery grading',
      localStart: `${today.plus({ days: 5 }).toISODate()}T08:00`,
      tankIds: NURSERY_CODES.map((c) => tanks.get(c)!),
      notes: '',
    }),
    manager,
  )
  await recordCylinderReading(1, { pressure: 168, flowLPerMin: 6 })

  log(
    `Seeded ${DEMO_PEOPLE.length} people, ${DEMO_TANKS.length} tanks, ${DEMO_ROUTINES.length} routines, ${created} tasks, ${history} past completions, ${movements} stock movements and 2 incidents (today is ${today.toISODate()}).`,
  )
}
