import { DateTime } from 'luxon'
import { estimateSupply, pressureUnitFor, type CylinderSettings } from '#shared/oxygen-supply/cylinder'
import type { CylinderReadingInput, CylinderStatus, ParsedCylinderInput } from '#shared/schemas/oxygen'
import { db } from '../../db/data-source'
import { conflict, notFound, validationError } from '../../lib/errors'
import { raiseCriticalAlert } from '../completions/follow-ups'
import { getFacility } from '../facility/facility.service'
import { createTask, openTask } from '../tasks/task-writes.service'
import { CylinderEntity, type CylinderRow } from './oxygen.entities'

const repo = () => db().getRepository(CylinderEntity)

function settingsOf(c: CylinderRow): CylinderSettings {
  return c.method === 'metric'
    ? {
        method: 'metric',
        waterCapacityL: c.waterCapacityL!,
        reserveBar: c.reservePressure,
        compressibility: c.compressibility ? { atReading: c.compressibility } : undefined,
      }
    : { method: 'psi-factor', factorLPerPsi: c.factorLPerPsi!, reservePsi: c.reservePressure }
}

/** Below the facility's minimum hours a cylinder is low; below a quarter of it (or at reserve) it is critical. */
function levelOf(hours: number | null, minHours: number): CylinderStatus['level'] {
  if (hours === null) return 'unknown'
  if (hours <= minHours / 4) return 'critical'
  return hours < minHours ? 'low' : 'ok'
}

const replaceTitle = (c: CylinderRow) => `Replace oxygen cylinder ${c.code}`

async function toStatus(c: CylinderRow, minHours: number): Promise<CylinderStatus> {
  const estimate =
    c.lastPressure !== null && c.flowLPerMin > 0 ? estimateSupply(settingsOf(c), { gaugePressure: c.lastPressure, flowLPerMin: c.flowLPerMin }) : null
  const openReplace = c.replaceTaskId === null ? null : await openTask(c.replaceTaskId)
  return {
    id: c.id,
    code: c.code,
    label: c.label,
    method: c.method,
    unit: pressureUnitFor(settingsOf(c)),
    reservePressure: c.reservePressure,
    lastPressure: c.lastPressure,
    flowLPerMin: c.flowLPerMin,
    lastReadAt: c.lastReadAt?.toISOString() ?? null,
    gasLeftL: estimate ? Math.round(estimate.gasLeftL) : null,
    hoursToReserve: estimate ? Math.round(estimate.hoursToReserve * 10) / 10 : null,
    level: levelOf(estimate?.hoursToReserve ?? null, minHours),
    replaceTaskId: openReplace?.id ?? null,
  }
}

export async function listCylinders(): Promise<CylinderStatus[]> {
  const { minOxygenHours } = await getFacility()
  return Promise.all((await repo().find({ where: { active: true }, order: { code: 'ASC' } })).map((c) => toStatus(c, minOxygenHours)))
}

export async function createCylinder(data: ParsedCylinderInput): Promise<CylinderStatus> {
  if (await repo().findOneBy({ code: data.code })) throw conflict(`Another cylinder already has the code ${data.code}.`)
  const row = await repo().save({ ...data, lastPressure: null, lastReadAt: null, active: true, replaceTaskId: null })
  return toStatus(row, (await getFacility()).minOxygenHours)
}

/**
 * A gauge reading: works out the gas left and the time to the reserve pressure at the flow in
 * use. Less than the facility's minimum hours raises a "replace cylinder" task on the board;
 * a critical level also starts the escalation ladder.
 */
export async function recordCylinderReading(id: number, reading: CylinderReadingInput): Promise<CylinderStatus> {
  const cylinder = await repo().findOneBy({ id })
  if (!cylinder) throw notFound('That cylinder')
  try {
    estimateSupply(settingsOf(cylinder), { gaugePressure: reading.pressure, flowLPerMin: reading.flowLPerMin })
  } catch (err) {
    throw validationError((err as Error).message, { pressure: [(err as Error).message] })
  }
  const saved = await repo().save({ ...cylinder, lastPressure: reading.pressure, flowLPerMin: reading.flowLPerMin, lastReadAt: new Date() })
  const facility = await getFacility()
  const status = await toStatus(saved, facility.minOxygenHours)
  if ((status.level === 'low' || status.level === 'critical') && !status.replaceTaskId) {
    status.replaceTaskId = await raiseReplaceTask(saved, status, facility.timeZone)
  }
  return status
}

async function raiseReplaceTask(c: CylinderRow, status: CylinderStatus, zone: string): Promise<number> {
  const due = DateTime.now().setZone(zone).plus({ minutes: 30 })
  const critical = status.level === 'critical'
  const task = await createTask({
    routineId: null,
    eventId: null,
    title: replaceTitle(c),
    category: 'life_support',
    instructions: `${status.hoursToReserve} h of oxygen left to the reserve pressure at ${c.flowLPerMin} L/min. Change over to a full cylinder and record the new pressure.`,
    priority: critical ? 'welfare_critical' : 'routine',
    targetKind: 'facility',
    targetId: 0,
    tankId: null,
    areaId: null,
    localDate: due.toISODate()!,
    localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    occurrenceStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    dueAt: due.toJSDate(),
    windowStartAt: new Date(),
    graceUntil: due.plus({ minutes: 30 }).toJSDate(),
    durationMinutes: 15,
    status: 'open',
    assigneeId: null,
    requiredReadings: [],
    version: 1,
  })
  await repo().update(c.id, { replaceTaskId: task.id })
  if (critical) {
    await raiseCriticalAlert(task.id, `cylinder_bar ${c.lastPressure} at ${c.code}: ${status.hoursToReserve} h to reserve`)
  }
  return task.id
}
