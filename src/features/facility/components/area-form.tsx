import type { Area } from '#shared/schemas/facility'
import { Field } from '../../../components/ui/field'
import { useCatalogueForm } from '../hooks/use-catalogue-form'
import { CheckboxField } from './checkbox-field'
import { FormShell } from './form-shell'

export function AreaForm({ area, nextRoundOrder, onDone }: { area?: Area; nextRoundOrder: number; onDone: () => void }) {
  const { form, submit, pending, editing } = useCatalogueForm('areas', {
    item: area,
    defaults: { code: '', name: '', roundOrder: nextRoundOrder, quarantine: false },
    onDone,
  })
  const errors = form.formState.errors
  return (
    <FormShell
      title={editing ? `Edit area ${area?.code}` : 'New area'}
      submitLabel={editing ? 'Save area' : 'Add area'}
      pending={pending}
      onSubmit={submit}
      onCancel={onDone}
      error={errors.root?.server?.message}
    >
      <Field label="Code" autoComplete="off" hint="Short and unique, e.g. NUR" {...form.register('code')} error={errors.code?.message} />
      <Field label="Name" autoComplete="off" {...form.register('name')} error={errors.name?.message} />
      <Field
        label="Round order"
        type="number"
        inputMode="numeric"
        hint="Rounds walk areas from low to high: clean areas first, quarantine last."
        {...form.register('roundOrder', { valueAsNumber: true })}
        error={errors.roundOrder?.message}
      />
      <CheckboxField label="Quarantine area" hint="Walked last on every round." {...form.register('quarantine')} />
    </FormShell>
  )
}
