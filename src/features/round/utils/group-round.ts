import type { Round, RoundTask } from '#shared/schemas/round'

export interface TargetGroup {
  key: string
  label: string
  tasks: RoundTask[]
}

export interface AreaGroup {
  key: string
  area: Round['areas'][number] | null
  targets: TargetGroup[]
}

/** Areas in walking order, each with its tanks (or other targets) in the order the tasks come. */
export function groupRound(round: Round): AreaGroup[] {
  const groups: AreaGroup[] = []
  for (const task of round.tasks) {
    const area = round.areas.find((a) => a.id === task.areaId) ?? null
    const areaKey = area ? `area-${area.id}` : 'elsewhere'
    let group = groups.find((g) => g.key === areaKey)
    if (!group) groups.push((group = { key: areaKey, area, targets: [] }))
    const targetKey = `${task.targetKind}-${task.targetId ?? 0}`
    let target = group.targets.find((t) => t.key === targetKey)
    if (!target) group.targets.push((target = { key: targetKey, label: task.targetLabel, tasks: [] }))
    target.tasks.push(task)
  }
  return groups
}

export const isFinished = (task: RoundTask) => task.status === 'done' || task.status === 'skipped'

/** The same groups cut after the first `limit` tasks (in walking order), for a first screen. */
export function firstTasks(groups: AreaGroup[], limit: number): AreaGroup[] {
  const cut: AreaGroup[] = []
  let left = limit
  for (const group of groups) {
    if (left <= 0) break
    const targets: TargetGroup[] = []
    for (const target of group.targets) {
      if (left <= 0) break
      targets.push(target.tasks.length <= left ? target : { ...target, tasks: target.tasks.slice(0, left) })
      left -= target.tasks.length
    }
    cut.push({ ...group, targets })
  }
  return cut
}
