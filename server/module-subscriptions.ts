import { subscribeIncidents } from './modules/incidents/subscriptions'
import { subscribeScheduling } from './modules/scheduling/subscriptions'

/**
 * Connects the modules that act on changes announced by modules below them (record 13e). Every
 * process that runs the services calls it once before them: the app (and so the server and the
 * tests), the seed and the benchmarks. Calling it again changes nothing.
 */
export function subscribeModules() {
  subscribeScheduling()
  subscribeIncidents()
}
