import type { Role } from '#shared/schemas/person'

const ALL: Role[] = ['manager', 'supervisor', 'technician', 'observer']
const M: Role[] = ['manager']
const MS: Role[] = ['manager', 'supervisor']
const MSO: Role[] = ['manager', 'supervisor', 'observer']
const MST: Role[] = ['manager', 'supervisor', 'technician']

/**
 * Who may call each route: 'public' needs no session; otherwise the roles the server lets
 * through. The security test reads the routes from the app itself, so a new route without a
 * line here fails it.
 */
export const ROUTE_ACCESS: Record<string, Role[] | 'public'> = {
  'GET /api/health': 'public',
  'POST /api/session': 'public',
  'DELETE /api/session': 'public',
  'GET /ack/:token': 'public',
  'POST /ack/:token': 'public',
  // The text provider's webhooks: no session; each is refused without a valid provider signature.
  'POST /hooks/sms/status': 'public',
  'POST /hooks/sms/inbound': 'public',
  'GET /api/me': ALL,
  'GET /api/people': M,
  'POST /api/people': M,
  'PATCH /api/people/:id': M,
  'POST /api/people/:id/password': M,
  'GET /api/staff': MS,
  'GET /api/facility': ALL,
  'PATCH /api/facility': M,
  'POST /api/tanks/import': M,
  ...catalogue('areas', M),
  ...catalogue('systems', M),
  ...catalogue('tanks', M),
  ...catalogue('equipment', M),
  ...catalogue('batches', MS),
  'GET /api/parameters': ALL,
  'GET /api/limits': ALL,
  'PUT /api/limits': M,
  'DELETE /api/limits/:id': M,
  'GET /api/routines': ALL,
  'GET /api/routines/:id': ALL,
  'POST /api/routines': MS,
  'PUT /api/routines/:id': MS,
  'DELETE /api/routines/:id': M,
  'GET /api/tasks': ALL,
  'GET /api/tasks/round': MST,
  'GET /api/tasks/round-sheet': MST,
  'GET /api/tasks/board': ALL,
  'POST /api/tasks/bulk-move': MS,
  'PATCH /api/tasks/:id': MS,
  'GET /api/tasks/:id': ALL,
  'POST /api/tasks': MS,
  'POST /api/tasks/:id/completion': MST,
  'GET /api/tasks/:id/completion': ALL,
  'POST /api/completions/:completionId/amendments': MST,
  'POST /api/tasks/:id/take': MST,
  'POST /api/tasks/:id/photos': MST,
  'GET /api/tasks/:id/photos': ALL,
  'GET /api/photos/:photoId': ALL,
  'GET /api/shifts': ALL,
  'POST /api/shifts': MS,
  'POST /api/shifts/pattern': MS,
  'PATCH /api/shifts/:id': MS,
  'DELETE /api/shifts/:id': MS,
  'GET /api/on-call-duties': ALL,
  'POST /api/on-call-duties': MS,
  'POST /api/on-call-duties/rotation': MS,
  'DELETE /api/on-call-duties/:id': MS,
  'GET /api/roster/coverage': MS,
  'GET /api/calendar': ALL,
  'GET /api/on-call': ALL,
  'POST /api/on-call/notes': MST,
  'GET /api/ladders': ALL,
  'POST /api/ladders': M,
  'PUT /api/ladders/:id': M,
  'GET /api/tasks/:id/escalations': ALL,
  'POST /api/alerts/:id/acknowledge': MST,
  'GET /api/me/preferences': ALL,
  'PATCH /api/me/preferences': ALL,
  'GET /api/push/public-key': ALL,
  'POST /api/me/push-subscriptions': ALL,
  'DELETE /api/me/push-subscriptions': ALL,
  'GET /api/outbox': M,
  'GET /api/outbox/texts': M,
  'POST /api/outbox/texts/:id/reply': M,
  'GET /api/outbox/pushes': M,
  'POST /api/outbox/push-devices': M,
  'GET /api/playbooks': ALL,
  'GET /api/playbooks/:id': ALL,
  'POST /api/playbooks': M,
  'PUT /api/playbooks/:id': M,
  'GET /api/events': ALL,
  'GET /api/events/:id': ALL,
  'POST /api/events': MS,
  'PATCH /api/events/:id': MS,
  'POST /api/events/:id/cancel': MS,
  'POST /api/events/:id/end': MS,
  'GET /api/batches/:id/records': ALL,
  'POST /api/batches/:id/records': MST,
  'GET /api/oxygen/cylinders': ALL,
  'POST /api/oxygen/cylinders': MS,
  'POST /api/oxygen/cylinders/:id/readings': MST,
  'GET /api/reports/compliance': MSO,
  'GET /api/reports/responses': MSO,
  'GET /api/reports/welfare': MSO,
  'GET /api/reports/stock': MSO,
  'GET /api/reports/incidents': MSO,
  'GET /api/tanks/:id/overview': ALL,
  'GET /api/tanks/:id/readings': ALL,
  'GET /api/audit': MSO,
  'GET /api/stock/movements': ALL,
  'POST /api/stock/movements': MST,
  'GET /api/tanks/:id/stock': ALL,
  'GET /api/stock/on-hand': ALL,
  'GET /api/batches/:id/stock': ALL,
  'GET /api/stock/settings': ALL,
  'PATCH /api/stock/settings': M,
  'GET /api/incidents': ALL,
  'POST /api/incidents': MST,
  'GET /api/incidents/:id': ALL,
  'POST /api/incidents/:id/confirm': MS,
  'POST /api/incidents/:id/dismiss': MS,
  'PATCH /api/incidents/:id': MS,
  'POST /api/incidents/:id/notes': MSO,
}

function catalogue(name: string, editors: Role[]): Record<string, Role[]> {
  return {
    [`GET /api/${name}`]: ALL,
    [`GET /api/${name}/:id`]: ALL,
    [`POST /api/${name}`]: editors,
    [`PATCH /api/${name}/:id`]: editors,
    [`DELETE /api/${name}/:id`]: editors,
  }
}

/** A concrete path for a route pattern: ids that do not exist (an allowed caller gets 404 or 400, never 401/403). */
export const concretePath = (pattern: string) =>
  pattern
    .replace(':completionId', '00000000-0000-4000-8000-000000000000')
    .replace(':photoId', '00000000-0000-4000-8000-000000000000')
    .replace(':token', 'not-a-token')
    .replace(/:id/g, '987654')
