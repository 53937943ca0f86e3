import { useMutation, useQueryClient } from '@tanstack/react-query'
import { TankImportResultSchema } from '#shared/schemas/facility'
import { catalogueKeys } from '../../../api/catalogues'
import { apiFetch } from '../../../lib/api-client'

export function useImportTanks() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (file: File) => {
      const body = new FormData()
      body.append('file', file)
      return apiFetch('/tanks/import', TankImportResultSchema, { method: 'POST', body })
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.list('tanks') }),
  })
}
