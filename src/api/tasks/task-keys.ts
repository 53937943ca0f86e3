// Every cached view of tasks lives under one root, so a reconnect's catch-up or a bulk change
// refreshes them all with one invalidation, and live events patch them in place (task-cache.ts).
const all = ['tasks'] as const

export const taskKeys = {
  all,
  /** GET /api/tasks lists; the filter object is the key's third part and is read back by the list patcher. */
  lists: () => [...all, 'list'] as const,
  list: (filter: Record<string, unknown>) => [...all, 'list', filter] as const,
  detail: (id: number) => [...all, 'detail', id] as const,
  boards: () => [...all, 'board'] as const,
  board: (date: string) => [...all, 'board', date] as const,
  calendars: () => [...all, 'calendar'] as const,
  calendar: (from: string, to: string) => [...all, 'calendar', from, to] as const,
  rounds: () => [...all, 'round'] as const,
  round: (date: string | null) => [...all, 'round', date ?? 'today'] as const,
  roundSheets: () => [...all, 'round-sheet'] as const,
  roundSheet: (filter: object) => [...all, 'round-sheet', filter] as const,
}
