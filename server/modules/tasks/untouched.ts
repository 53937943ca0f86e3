/**
 * SQL over `tasks` for a task nobody has touched, the only kind a routine, tank or event change
 * deletes: not finished, not assigned by hand, not edited, and no other record points at it (a
 * photo taken before finishing, an alert, an incident, a cylinder's replace task). Those rows'
 * foreign keys would refuse the delete (record 13f), so such a task stays like an edited one.
 */
export const UNTOUCHED_TASK = [
  'assignedManually = 0 AND edited = 0 AND completedAt IS NULL',
  'NOT EXISTS (SELECT 1 FROM photos p WHERE p.taskId = tasks.id)',
  'NOT EXISTS (SELECT 1 FROM alerts a WHERE a.taskId = tasks.id)',
  'NOT EXISTS (SELECT 1 FROM incidents i WHERE i.taskId = tasks.id)',
  'NOT EXISTS (SELECT 1 FROM oxygen_cylinders c WHERE c.replaceTaskId = tasks.id)',
].join(' AND ')
