import { TANK_KINDS, type Area, type System, type Tank } from '#shared/schemas/facility'
import { Field } from '../../../components/ui/field'
import { useCatalogueForm } from '../hooks/use-catalogue-form'
import { toOptionalNumber, toRequiredNumber } from '../utils/form-values'
import { CheckboxField } from './checkbox-field'
import { FormShell } from './form-shell'
import { SelectField } from '../../../components/ui/select-field'

interface TankFormProps {
  tank?: Tank
  areas: Area[]
  systems: System[]
  onDone: () => void
}

const KIND_LABELS: Record<Tank['kind'], string> = { tank: 'Tank', bin: 'Bin' }

export function TankForm({ tank, areas, systems, onDone }: TankFormProps) {
  const { form, submit, pending, editing } = useCatalogueForm('tanks', {
    item: tank,
    defaults: { code: '', name: '', areaId: areas[0]?.id, systemId: null, kind: 'tank', inUse: true },
    onDone,
  })
  const errors = form.formState.errors
  return (
    <FormShell
      title={editing ? `Edit tank ${tank?.code}` : 'New tank'}
      submitLabel={editing ? 'Save tank' : 'Add tank'}
      pending={pending}
      onSubmit={submit}
      onCancel={onDone}
      error={errors.root?.server?.message}
    >
      <Field label="Code" autoComplete="off" hint="Printed on the tank label, e.g. N-04" {...form.register('code')} error={errors.code?.message} />
      <Field label="Name" autoComplete="off" {...form.register('name')} error={errors.name?.message} />
      <SelectField label="Area" {...form.register('areaId', { setValueAs: toRequiredNumber })} error={errors.areaId && 'Choose an area'}>
        {areas.length === 0 && <option value="">Add an area first</option>}
        {areas.map((a) => (
          <option key={a.id} value={a.id}>
            {a.name} ({a.code})
          </option>
        ))}
      </SelectField>
      <SelectField label="System" {...form.register('systemId', { setValueAs: toOptionalNumber })} error={errors.systemId?.message}>
        <option value="">Not on a system (standalone)</option>
        {systems.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name} ({s.code})
          </option>
        ))}
      </SelectField>
      <Field
        label="Volume (litres)"
        type="number"
        inputMode="decimal"
        step="any"
        {...form.register('volumeL', { valueAsNumber: true })}
        error={errors.volumeL?.message}
      />
      <SelectField label="Kind" {...form.register('kind')} error={errors.kind?.message}>
        {TANK_KINDS.map((k) => (
          <option key={k} value={k}>
            {KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <CheckboxField label="In use" hint="Holds fish now; an empty tank gets no new tasks." {...form.register('inUse')} />
    </FormShell>
  )
}
