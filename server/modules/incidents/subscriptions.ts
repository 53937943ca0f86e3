import { completionJudged } from '../completions/completion-judged'
import { proposeIncidentsAfterCompletion } from './completion-proposals'

/** Incidents proposes from the completions that completions announces (record 13e). */
export function subscribeIncidents() {
  completionJudged.subscribe(proposeIncidentsAfterCompletion)
}
