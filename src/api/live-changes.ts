import type { QueryClient, QueryKey } from '@tanstack/react-query'
import type { ChangeKind } from '#shared/schemas/live'
import { catalogueKeys } from './catalogues'
import { facilityKeys } from './facility'
import { parameterKeys } from './parameters'
import { taskKeys } from './tasks/task-keys'

// Roots of the feature caches that show each kind. Features own those keys and src/api may not
// import features, so their roots are named here once; a renamed root must be renamed here too.
const ROUTINES: QueryKey = ['routines']
const EVENTS: QueryKey = ['events']
const PLAYBOOKS: QueryKey = ['playbooks']
const ROSTER: QueryKey = ['roster']
const ON_CALL: QueryKey = ['on-call']
const OXYGEN: QueryKey = ['oxygen']
const TANK_PAGE: QueryKey = ['tank-page']
const REPORTS: QueryKey = ['reports']
const INCIDENTS: QueryKey = ['incidents']

const SHOWN_BY: Record<Exclude<ChangeKind, 'task' | 'tasks'>, QueryKey[]> = {
  routine: [ROUTINES],
  // An amendment corrects readings: the tank page, the reports and the task's own page show them.
  amendment: [taskKeys.all, TANK_PAGE, REPORTS],
  catalogue: [catalogueKeys.all, TANK_PAGE],
  facility: [facilityKeys.all],
  // An event's change creates, removes or holds its tasks.
  event: [EVENTS, taskKeys.all],
  roster: [ROSTER, ON_CALL],
  // The animal record report lists incidents with their deadlines.
  incident: [INCIDENTS, REPORTS],
  oxygen: [OXYGEN],
  stock: [TANK_PAGE, REPORTS],
  parameter: [parameterKeys.parameters, parameterKeys.limits],
  playbook: [PLAYBOOKS],
}

/** Another screen changed these kinds of records: refetch every cached view that shows them, once. */
export function refetchChangedKinds(queryClient: QueryClient, kinds: readonly ChangeKind[]) {
  const keys = new Map<string, QueryKey>()
  for (const kind of kinds) {
    if (kind === 'task' || kind === 'tasks') continue
    for (const key of SHOWN_BY[kind]) keys.set(JSON.stringify(key), key)
  }
  return Promise.all([...keys.values()].map((queryKey) => queryClient.invalidateQueries({ queryKey }, { cancelRefetch: false })))
}
