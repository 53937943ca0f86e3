import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { catalogueKeys, itemSchema, type CatalogueInput, type CatalogueName } from '../../../api/catalogues'
import { apiFetch, jsonBody } from '../../../lib/api-client'

function useInvalidate(name: CatalogueName) {
  const queryClient = useQueryClient()
  return () => queryClient.invalidateQueries({ queryKey: catalogueKeys.list(name) })
}

export function useCreateItem<K extends CatalogueName>(name: K) {
  const onSuccess = useInvalidate(name)
  return useMutation({
    mutationFn: (input: CatalogueInput<K>) => apiFetch(`/${name}`, itemSchema(name), { method: 'POST', ...jsonBody(input) }),
    onSuccess,
  })
}

export function useUpdateItem<K extends CatalogueName>(name: K) {
  const onSuccess = useInvalidate(name)
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: Partial<CatalogueInput<K>> }) =>
      apiFetch(`/${name}/${id}`, itemSchema(name), { method: 'PATCH', ...jsonBody(input) }),
    onSuccess,
  })
}

export function useDeleteItem(name: CatalogueName) {
  const onSuccess = useInvalidate(name)
  return useMutation({
    mutationFn: (id: number) => apiFetch(`/${name}/${id}`, z.null(), { method: 'DELETE' }),
    onSuccess,
  })
}
