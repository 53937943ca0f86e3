import type { Round, RoundTask } from '#shared/schemas/round'

export interface SheetArea {
  key: string
  area: Round['areas'][number] | null
  tasks: RoundTask[]
}

/** Areas in the order the server walked them (clean first, quarantine last), tasks kept in its order. */
export function groupByArea(round: Round): SheetArea[] {
  const groups: SheetArea[] = []
  for (const task of round.tasks) {
    const area = round.areas.find((a) => a.id === task.areaId) ?? null
    const key = area ? `area-${area.id}` : 'elsewhere'
    let group = groups.find((g) => g.key === key)
    if (!group) groups.push((group = { key, area, tasks: [] }))
    group.tasks.push(task)
  }
  return groups
}

export const isFinished = (task: RoundTask) => task.status === 'done' || task.status === 'skipped'
