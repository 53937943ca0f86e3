import { useMutation, useQueryClient } from '@tanstack/react-query'
import { FacilitySchema, type UpdateFacilityInput } from '#shared/schemas/facility'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { facilityKeys } from './facility-queries'

export function useUpdateFacility() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: UpdateFacilityInput) => apiFetch('/facility', FacilitySchema, { method: 'PATCH', ...jsonBody(input) }),
    onSuccess: (facility) => queryClient.setQueryData(facilityKeys.settings(), facility),
  })
}
