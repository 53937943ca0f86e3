import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { PersonSchema, StaffMemberSchema } from '#shared/schemas/person'
import { apiFetch } from '../lib/api-client'

export const staffKeys = {
  /** Active people with their roles, for planners (supervisors and managers). */
  staff: ['staff'] as const,
  /** Every account with its e-mail (managers only). */
  people: ['people'] as const,
}

export const staffQueries = {
  staff: () => queryOptions({ queryKey: staffKeys.staff, queryFn: () => apiFetch('/staff', z.array(StaffMemberSchema)) }),
  people: () => queryOptions({ queryKey: staffKeys.people, queryFn: () => apiFetch('/people', z.array(PersonSchema)) }),
}
