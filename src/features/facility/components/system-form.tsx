import type { Area, System } from '#shared/schemas/facility'
import { Field } from '../../../components/ui/field'
import { useCatalogueForm } from '../hooks/use-catalogue-form'
import { toOptionalNumber } from '../utils/form-values'
import { FormShell } from './form-shell'
import { SelectField } from '../../../components/ui/select-field'

export function SystemForm({ system, areas, onDone }: { system?: System; areas: Area[]; onDone: () => void }) {
  const { form, submit, pending, editing } = useCatalogueForm('systems', {
    item: system,
    defaults: { code: '', name: '', areaId: null, salinitySetpoint: null },
    onDone,
  })
  const errors = form.formState.errors
  return (
    <FormShell
      title={editing ? `Edit system ${system?.code}` : 'New system'}
      submitLabel={editing ? 'Save system' : 'Add system'}
      pending={pending}
      onSubmit={submit}
      onCancel={onDone}
      error={errors.root?.server?.message}
    >
      <Field label="Code" autoComplete="off" hint="e.g. RAS-1" {...form.register('code')} error={errors.code?.message} />
      <Field label="Name" autoComplete="off" {...form.register('name')} error={errors.name?.message} />
      <SelectField
        label="Area"
        hint="Leave open when the system feeds tanks in several areas."
        {...form.register('areaId', { setValueAs: toOptionalNumber })}
        error={errors.areaId?.message}
      >
        <option value="">Several areas</option>
        {areas.map((a) => (
          <option key={a.id} value={a.id}>
            {a.name} ({a.code})
          </option>
        ))}
      </SelectField>
      <Field
        label="Water volume (litres)"
        type="number"
        inputMode="decimal"
        step="any"
        hint="Whole loop: tanks, sump and filters."
        {...form.register('volumeL', { valueAsNumber: true })}
        error={errors.volumeL?.message}
      />
      <Field
        label="Salinity setpoint (ppt)"
        type="number"
        inputMode="decimal"
        step="any"
        hint="Leave empty for fresh water."
        {...form.register('salinitySetpoint', { setValueAs: toOptionalNumber })}
        error={errors.salinitySetpoint?.message}
      />
    </FormShell>
  )
}
