import { zodResolver } from '@hookform/resolvers/zod'
import { useForm, type DefaultValues, type Resolver } from 'react-hook-form'
import { toast } from 'sonner'
import type { z } from 'zod'
import { CATALOGUES, type CatalogueInput, type CatalogueItem, type CatalogueName } from '../../../api/catalogues'
import { useCreateItem, useUpdateItem } from '../api/use-catalogue-mutations'
import { applyServerErrors } from '../utils/apply-server-errors'
import { formMessages } from '../utils/form-messages'

interface Options<K extends CatalogueName> {
  item?: CatalogueItem<K>
  defaults: Partial<CatalogueInput<K>>
  onDone: () => void
}

/** One add-or-edit form for any catalogue: shared input schema, POST or PATCH, server errors at the fields. */
export function useCatalogueForm<K extends CatalogueName>(name: K, { item, defaults, onDone }: Options<K>) {
  const create = useCreateItem(name)
  const update = useUpdateItem(name)
  const schema = CATALOGUES[name].input as unknown as z.ZodType<CatalogueInput<K>, CatalogueInput<K>>
  const form = useForm<CatalogueInput<K>>({
    resolver: zodResolver(schema, { error: formMessages }) as unknown as Resolver<CatalogueInput<K>>,
    defaultValues: (item ? withoutId(item) : defaults) as DefaultValues<CatalogueInput<K>>,
  })

  const submit = form.handleSubmit((input) => {
    const handlers = {
      onSuccess: (saved: CatalogueItem<K>) => {
        toast.success(`${item ? 'Saved' : 'Added'} ${CATALOGUES[name].noun} ${saved.code}.`)
        onDone()
      },
      onError: (error: unknown) => applyServerErrors(form, error),
    }
    if (item) update.mutate({ id: item.id, input }, handlers)
    else create.mutate(input, handlers)
  })

  return { form, submit, pending: create.isPending || update.isPending, editing: item !== undefined }
}

function withoutId<T extends { id: number }>(item: T): Omit<T, 'id'> {
  const { id: _id, ...rest } = item
  return rest
}
