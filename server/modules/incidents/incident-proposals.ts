import { db } from '../../db/data-source'
import { recordChange } from '../../realtime/change-outbox'
import { IncidentEntity } from './incident.entity'
import { newIncident } from './new-incident'

export interface IncidentProposal {
  source: 'missed_task' | 'critical_recheck' | 'mortality_threshold'
  sourceKey: string
  taskId: number
  title: string
  whatHappened: string
  startedAt: Date
  tankIds: number[]
  batchIds?: number[]
  dead?: number
}

/**
 * Roundtide proposes, a person decides: the row starts as "proposed" and nothing is reported
 * until a supervisor or manager confirms it. Deadlines run from when it was noticed, with the
 * hours from the facility's settings. One proposal per cause (unique source key).
 */
export async function proposeIncident(p: IncidentProposal, now: Date): Promise<void> {
  const row = await newIncident({
    status: 'proposed',
    source: p.source,
    taskId: p.taskId,
    title: p.title,
    whatHappened: p.whatHappened,
    startedAt: p.startedAt,
    noticedAt: now,
    tankIds: p.tankIds,
    batchIds: p.batchIds ?? [],
    affected: p.dead ?? 0,
    dead: p.dead ?? 0,
  })
  await db()
    .getRepository(IncidentEntity)
    .createQueryBuilder()
    .insert()
    .values({ ...row, sourceKey: p.sourceKey })
    .orIgnore()
    .execute()
  await recordChange('incident')
}

/** Missed welfare-critical checks: one proposal each (the clock passes the tasks it just marked missed). */
export async function proposeForMissedTasks(tasks: Array<{ id: number; title: string; tankId: number | null; graceUntil: Date }>, now: Date) {
  for (const t of tasks) {
    await proposeIncident(
      {
        source: 'missed_task',
        sourceKey: `missed_task:${t.id}`,
        taskId: t.id,
        title: `Missed welfare-critical check: ${t.title}`,
        whatHappened: `"${t.title}" was not done within its grace time.`,
        startedAt: t.graceUntil,
        tankIds: t.tankId ? [t.tankId] : [],
      },
      now,
    )
  }
}

/** A recheck that reads critical again confirms the first critical reading: one proposal per recheck. */
export async function proposeForCriticalRecheck(
  recheck: { id: number; title: string; tankId: number | null },
  firstAt: Date | null,
  critical: string,
  now: Date,
) {
  const title = recheck.title.replace(/^Recheck: /, '')
  await proposeIncident(
    {
      source: 'critical_recheck',
      sourceKey: `critical_recheck:${recheck.id}`,
      taskId: recheck.id,
      title: `Critical reading confirmed by its recheck: ${title}`,
      whatHappened: `The recheck of "${title}" read critical again: ${critical}.`,
      startedAt: firstAt ?? now,
      tankIds: recheck.tankId ? [recheck.tankId] : [],
    },
    now,
  )
}

/** Deaths on the round took the batch's 7-day losses over the facility's threshold: one proposal per crossing. */
export async function proposeForMortalityThreshold(
  p: {
    taskId: number
    completionId: string
    tankId: number
    tankCode: string
    batchId: number
    dead: number
    weekDead: number
    weekPct: number
    thresholdPct: number
  },
  now: Date,
) {
  await proposeIncident(
    {
      source: 'mortality_threshold',
      sourceKey: `mortality_threshold:${p.completionId}`,
      taskId: p.taskId,
      title: `Deaths above the 7-day threshold in ${p.tankCode}`,
      whatHappened: `${p.dead} dead were removed from ${p.tankCode}; ${p.weekDead} of the batch died in the last 7 days (${p.weekPct.toFixed(1)} %, the facility's threshold is ${p.thresholdPct} %).`,
      startedAt: now,
      tankIds: [p.tankId],
      batchIds: [p.batchId],
      dead: p.weekDead,
    },
    now,
  )
}
