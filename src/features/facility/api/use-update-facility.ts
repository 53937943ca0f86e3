import { useMutation, useQueryClient } from '@tanstack/react-query'
import { FacilitySchema, type UpdateFacilityInput } from '#shared/schemas/facility'
import { facilityKeys } from '../../../api/facility'
import { apiFetch, jsonBody } from '../../../lib/api-client'

export function useUpdateFacility() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: UpdateFacilityInput) => apiFetch('/facility', FacilitySchema, { method: 'PATCH', ...jsonBody(input) }),
    // Every page reads the facility under this one key, so all of them show the new clock at once.
    onSuccess: (facility) => queryClient.setQueryData(facilityKeys.all, facility),
  })
}
