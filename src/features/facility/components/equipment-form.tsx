import { useId } from 'react'
import type { Area, Equipment } from '#shared/schemas/facility'
import { Field } from '../../../components/ui/field'
import { useCatalogueForm } from '../hooks/use-catalogue-form'
import { toOptionalNumber } from '../utils/form-values'
import { FormShell } from './form-shell'
import { SelectField } from '../../../components/ui/select-field'

const KIND_SUGGESTIONS = ['pump', 'blower', 'chiller', 'heater', 'UV steriliser', 'biofilter', 'drum filter', 'oxygen cone', 'probe', 'alarm unit']

export function EquipmentForm({ equipment, areas, onDone }: { equipment?: Equipment; areas: Area[]; onDone: () => void }) {
  const listId = useId()
  const { form, submit, pending, editing } = useCatalogueForm('equipment', {
    item: equipment,
    defaults: { code: '', name: '', kind: '', areaId: null },
    onDone,
  })
  const errors = form.formState.errors
  return (
    <FormShell
      title={editing ? `Edit equipment ${equipment?.code}` : 'New equipment'}
      submitLabel={editing ? 'Save equipment' : 'Add equipment'}
      pending={pending}
      onSubmit={submit}
      onCancel={onDone}
      error={errors.root?.server?.message}
    >
      <Field label="Code" autoComplete="off" hint="e.g. PUMP-2" {...form.register('code')} error={errors.code?.message} />
      <Field label="Name" autoComplete="off" {...form.register('name')} error={errors.name?.message} />
      <Field label="Kind" autoComplete="off" list={listId} {...form.register('kind')} error={errors.kind?.message} />
      <datalist id={listId}>
        {KIND_SUGGESTIONS.map((k) => (
          <option key={k} value={k} />
        ))}
      </datalist>
      <SelectField label="Area" {...form.register('areaId', { setValueAs: toOptionalNumber })} error={errors.areaId?.message}>
        <option value="">No single area</option>
        {areas.map((a) => (
          <option key={a.id} value={a.id}>
            {a.name} ({a.code})
          </option>
        ))}
      </SelectField>
    </FormShell>
  )
}
