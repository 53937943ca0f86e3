import type { JudgedCompletion } from '../completions/completion-judged'
import { getTaskRow } from '../tasks/tasks.service'
import { proposeForCriticalRecheck, proposeForMortalityThreshold } from './incidents.service'

/**
 * After a completion is saved: Roundtide proposes (never files) an incident when a recheck reads
 * critical again after a critical first reading, or when the round's deaths take the batch over
 * the facility's 7-day threshold. A person confirms or dismisses each proposal.
 */
export async function proposeIncidentsAfterCompletion({ task, flag, readings, mortality, completionId, now }: JudgedCompletion) {
  if (flag === 'critical' && task.recheckOfTaskId) {
    const first = await getTaskRow(task.recheckOfTaskId).catch(() => null)
    if (first?.flag === 'critical') {
      const critical = readings
        .filter((r) => r.band === 'critical')
        .map((r) => `${r.parameterKey} ${r.value} ${r.unit}`)
        .join(', ')
      await proposeForCriticalRecheck(task, first.completedAt, critical, now)
    }
  }
  if (mortality?.crossedThreshold) {
    await proposeForMortalityThreshold(
      {
        taskId: task.id,
        completionId,
        tankId: mortality.tankId,
        tankCode: mortality.tankCode,
        batchId: mortality.batchId,
        dead: mortality.count,
        weekDead: mortality.weekDead,
        weekPct: mortality.weekPct,
        thresholdPct: mortality.thresholdPct,
      },
      now,
    )
  }
}
