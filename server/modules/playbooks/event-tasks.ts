import { stepOccurrences } from '#shared/playbooks/step-times'
import type { NewTask } from '../tasks/task-writes.service'
import type { Catalogue } from '../tasks/targets'
import type { EventRow, PlaybookRow } from './playbook.entities'

/** The tasks a playbook makes for one event: per tank where the step says so, else one for the event. */
export function planEventTasks(event: EventRow, playbook: PlaybookRow, tankIds: number[], cat: Catalogue): NewTask[] {
  const zone = cat.facility.timeZone
  const tanks = tankIds.map((id) => cat.tanks.get(id)).filter((t) => !!t)
  const rows: NewTask[] = []
  for (const step of playbook.steps) {
    const targets =
      step.perTank || !tanks.length
        ? tanks.map((t) => ({ kind: 'tank' as const, id: t.id, tankId: t.id, areaId: t.areaId }))
        : [{ kind: 'tank' as const, id: tanks[0].id, tankId: tanks[0].id, areaId: tanks[0].areaId }]
    for (const occ of stepOccurrences(step, event.localStart, zone)) {
      for (const target of targets) {
        rows.push({
          routineId: null,
          eventId: event.id,
          title: `${step.title} · ${event.title}`.slice(0, 160),
          category: step.category,
          instructions: step.instructions,
          priority: step.priority,
          targetKind: target.kind,
          targetId: target.id,
          tankId: target.tankId,
          areaId: target.areaId,
          localDate: occ.local.slice(0, 10),
          localStart: occ.local,
          occurrenceStart: occ.local,
          dueAt: occ.utc,
          windowStartAt: new Date(occ.utc.getTime() - 30 * 60_000),
          graceUntil: new Date(occ.utc.getTime() + step.graceMinutes * 60_000),
          durationMinutes: step.durationMinutes,
          status: 'planned',
          assigneeId: step.assigneeRule.kind === 'person' ? step.assigneeRule.personId : null,
          assignedManually: false,
          edited: false,
          requiredReadings: step.requiredReadings,
          version: 1,
        })
      }
    }
  }
  return rows
}
