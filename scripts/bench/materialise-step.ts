import { DateTime } from 'luxon'
import { materialise } from '#server/modules/scheduling/materialiser'
import { log, seconds, type Row } from './stats'

export const HORIZON_DAYS = 42
const GOAL_S = 10

/** Measurement 1: the whole facility's 42-day horizon from the start of the facility's today. */
export async function measureMaterialise(zone: string): Promise<Row> {
  const from = DateTime.now().setZone(zone).startOf('day').toJSDate()
  const start = performance.now()
  let lastShown = 0
  let insertsDone = 0
  const { created, routines } = await materialise({
    from,
    horizonDays: HORIZON_DAYS,
    onProgress: (done, total, made) => {
      if (done === total) insertsDone = performance.now()
      if (done === total || performance.now() - lastShown > 1000) {
        lastShown = performance.now()
        log(`materialise: ${done}/${total} routines, ${made} tasks (${seconds(lastShown - start)})`)
      }
    },
  })
  const wall = performance.now() - start
  // Idempotent: the same horizon again must add nothing.
  const rerunStart = performance.now()
  const rerun = await materialise({ from, horizonDays: HORIZON_DAYS })
  if (rerun.created !== 0) throw new Error(`a second run created ${rerun.created} tasks; it should create none`)
  return {
    measurement: `1 materialise ${HORIZON_DAYS}-day horizon`,
    result: `${seconds(wall)}, ${Math.round(created / (wall / 1000)).toLocaleString('en')} tasks/s (goal ≤ ${GOAL_S} s: ${wall <= GOAL_S * 1000 ? 'met' : 'NOT met'})`,
    detail: `${created.toLocaleString('en')} tasks from ${routines} routines (${Math.round(created / HORIZON_DAYS).toLocaleString('en')}/day): planning and inserts ${seconds(insertsDone - start)}, then assignee rules and fasting holds ${seconds(wall - (insertsDone - start))}; a second run created 0 in ${seconds(performance.now() - rerunStart)}`,
  }
}
