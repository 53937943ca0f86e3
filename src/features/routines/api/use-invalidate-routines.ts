import { useQueryClient } from '@tanstack/react-query'
import type { Routine } from '#shared/schemas/routine'
import { taskKeys } from '../../../api/tasks/task-keys'
import { routineKeys } from './routine-queries'

/** Saving a routine changes the list and its materialised tasks; the saved routine is the detail. */
export function useInvalidateRoutines() {
  const queryClient = useQueryClient()
  return (saved: Routine) => {
    queryClient.setQueryData(routineKeys.detail(saved.id), saved)
    return Promise.all([queryClient.invalidateQueries({ queryKey: routineKeys.lists() }), queryClient.invalidateQueries({ queryKey: taskKeys.lists() })])
  }
}
