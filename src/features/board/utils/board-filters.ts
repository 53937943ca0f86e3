import { CategorySchema, type Category } from '#shared/schemas/routine'
import type { BoardCard } from '#shared/schemas/board'
import { TaskStatusSchema, type TaskStatus } from '#shared/schemas/task'

export interface BoardFilters {
  areaId: number | null
  category: Category | null
  status: TaskStatus | null
}

export function readFilters(params: URLSearchParams): BoardFilters {
  const area = Number(params.get('area'))
  return {
    areaId: Number.isInteger(area) && area > 0 ? area : null,
    category: CategorySchema.safeParse(params.get('category')).data ?? null,
    status: TaskStatusSchema.safeParse(params.get('status')).data ?? null,
  }
}

export function writeFilters(params: URLSearchParams, filters: BoardFilters): URLSearchParams {
  const next = new URLSearchParams(params)
  const set = (key: string, value: string | number | null) => (value === null ? next.delete(key) : next.set(key, String(value)))
  set('area', filters.areaId)
  set('category', filters.category)
  set('status', filters.status)
  return next
}

export const isFiltered = (f: BoardFilters) => f.areaId !== null || f.category !== null || f.status !== null

export const matchesFilters = (task: BoardCard, f: BoardFilters) =>
  (f.areaId === null || task.areaId === f.areaId) && (f.category === null || task.category === f.category) && (f.status === null || task.status === f.status)
