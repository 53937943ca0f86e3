import type { Reading } from '#shared/schemas/completion'
import type { Band } from '#shared/schemas/parameter'
import { moduleHook } from '../../lib/module-hook'
import type { RoundMortalityPlan } from '../stock/round-mortality'

/** A completion, or an amendment that made a reading critical, as judged; announced inside its transaction. */
export interface JudgedCompletion {
  task: { id: number; title: string; tankId: number | null; recheckOfTaskId: number | null }
  flag: Band
  readings: Reading[]
  mortality: RoundMortalityPlan | null | undefined
  completionId: string
  now: Date
}

/**
 * Incidents, a module above this one (it raises its alerts through completions), proposes
 * incidents from judged completions; it subscribes at startup (record 13e).
 */
export const completionJudged = moduleHook<JudgedCompletion>('completion judged')
