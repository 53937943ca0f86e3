import type { QueryClient } from '@tanstack/react-query'
import type { Task } from '#shared/schemas/task'
import { taskKeys } from './task-keys'

type Filter = Record<string, unknown>

const CHECKS: Record<string, (task: Task, value: unknown) => boolean> = {
  date: (t, v) => t.localDate === v,
  from: (t, v) => t.localDate >= String(v),
  to: (t, v) => t.localDate <= String(v),
  areaId: (t, v) => t.areaId === Number(v),
  category: (t, v) => t.category === v,
  assigneeId: (t, v) => (v === 'none' ? t.assigneeId === null : t.assigneeId === Number(v)),
  status: (t, v) => t.status === v,
  routineId: (t, v) => t.routineId === Number(v),
  tankId: (t, v) => t.tankId === Number(v),
}

/** Whether a task belongs in a list with this filter (the GET /api/tasks query); null when the filter is not understood. */
function fits(task: Task, filter: unknown): boolean | null {
  if (!filter || typeof filter !== 'object') return null
  const entries = Object.entries(filter as Filter).filter(([, v]) => v !== undefined && v !== null && v !== '')
  if (entries.some(([k]) => !CHECKS[k])) return null
  return entries.every(([k, v]) => CHECKS[k](task, v))
}

const byDue = (a: Task, b: Task) => a.dueAt.localeCompare(b.dueAt) || a.id - b.id

/** Patches every cached task list with one changed task, without refetching the ones it can place. */
export function patchTaskLists(queryClient: QueryClient, task: Task) {
  for (const [queryKey, data] of queryClient.getQueriesData<Task[]>({ queryKey: taskKeys.lists() })) {
    if (!Array.isArray(data)) continue
    const existing = data.find((t) => t.id === task.id)
    if (existing && existing.version > task.version) continue
    const others = data.filter((t) => t.id !== task.id)
    const fit = fits(task, queryKey[2])
    if (fit === null) {
      if (existing)
        queryClient.setQueryData(
          queryKey,
          data.map((t) => (t.id === task.id ? task : t)),
        )
      else void queryClient.invalidateQueries({ queryKey, exact: true })
    } else if (fit) {
      queryClient.setQueryData(queryKey, [...others, task].sort(byDue))
    } else if (existing) {
      queryClient.setQueryData(queryKey, others)
    }
  }
}
