import { useQueryClient } from '@tanstack/react-query'
import { routineKeys, routineTaskKeys } from './routine-queries'

/** Saving or deleting a routine changes its materialised tasks as well as the routine list. */
export function useInvalidateRoutines() {
  const queryClient = useQueryClient()
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: routineKeys.all }),
      queryClient.invalidateQueries({ queryKey: routineTaskKeys.lists() }),
    ])
}
