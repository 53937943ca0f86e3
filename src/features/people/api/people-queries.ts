import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { PersonSchema } from '#shared/schemas/person'
import { apiFetch } from '../../../lib/api-client'

export const peopleKeys = { all: ['people'] as const, list: () => [...peopleKeys.all, 'list'] as const }

export const peopleQueries = {
  list: () => queryOptions({ queryKey: peopleKeys.list(), queryFn: () => apiFetch('/people', z.array(PersonSchema)) }),
}
