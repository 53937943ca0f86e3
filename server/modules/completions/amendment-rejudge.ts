import type { ReadingJudgement } from '#shared/readings/judge-readings'
import { recheckOf, reflagTask, type TaskRow } from '../tasks/task-writes.service'
import type { CompletionRow } from './completion.entities'
import { completionJudged } from './completion-judged'
import { closeCriticalAlert, createRecheck, startCriticalAlert } from './follow-ups'

/**
 * After an amendment the corrected record is judged again and the task carries the new flag. A
 * reading that is now critical raises what a critical completion raises (the alert, a recheck,
 * a proposal when it confirms an earlier critical reading), each once however often the record
 * is amended; a reading that is no longer critical closes its alert, so no stale flag climbs the
 * ladder. Runs inside the amendment's transaction, so all of it commits with the correction.
 */
export async function reflagAfterAmendment(task: TaskRow, completion: CompletionRow, judged: ReadingJudgement, now: Date): Promise<TaskRow['flag']> {
  const flag = judged.flag === 'ok' ? null : judged.flag
  if (flag === task.flag) return flag
  await reflagTask(task.id, flag)
  const reflagged = { ...task, flag }
  if (flag === 'critical') {
    await startCriticalAlert(
      task,
      judged.readings.filter((r) => r.band === 'critical'),
    )
    await completionJudged.announce({ task: reflagged, flag: 'critical', readings: judged.readings, mortality: null, completionId: completion.id, now })
  }
  if (task.flag === 'critical') await closeCriticalAlert(task.id, now)
  // As on completion: a flag asks for a recheck by whoever did the check, except for a paper sheet typed in later.
  if (flag && completion.outcome === 'done' && completion.enteredById === null && !(await recheckOf(task.id)))
    await createRecheck(reflagged, completion.personId)
  return flag
}
