import { Controller } from 'react-hook-form'
import { BATCH_STATUSES, type Batch, type Tank } from '#shared/schemas/facility'
import { Field } from '../../../components/ui/field'
import { useCatalogueForm } from '../hooks/use-catalogue-form'
import { BATCH_STATUS_LABELS } from './batch-status'
import { FormShell } from './form-shell'
import { TankPicker } from './tank-picker'
import { SelectField } from '../../../components/ui/select-field'

const today = () => new Date().toLocaleDateString('en-CA')

export function BatchForm({ batch, tanks, onDone }: { batch?: Batch; tanks: Tank[]; onDone: () => void }) {
  const { form, submit, pending, editing } = useCatalogueForm('batches', {
    item: batch,
    defaults: { code: '', species: '', origin: '', arrivalDate: today(), meanWeightG: 0, tankIds: [], status: 'quarantine' },
    onDone,
  })
  const errors = form.formState.errors
  return (
    <FormShell
      title={editing ? `Edit batch ${batch?.code}` : 'New batch'}
      submitLabel={editing ? 'Save batch' : 'Add batch'}
      pending={pending}
      onSubmit={submit}
      onCancel={onDone}
      error={errors.root?.server?.message}
    >
      <Field label="Code" autoComplete="off" hint="Lot number, e.g. B-2027-03" {...form.register('code')} error={errors.code?.message} />
      <Field label="Species" autoComplete="off" {...form.register('species')} error={errors.species?.message} />
      <Field label="Origin" autoComplete="off" hint="Supplier or source facility" {...form.register('origin')} error={errors.origin?.message} />
      <Field label="Arrival date" type="date" {...form.register('arrivalDate')} error={errors.arrivalDate?.message} />
      <Field label="Number of fish" type="number" inputMode="numeric" {...form.register('count', { valueAsNumber: true })} error={errors.count?.message} />
      <Field
        label="Mean weight (g)"
        type="number"
        inputMode="decimal"
        step="any"
        {...form.register('meanWeightG', { valueAsNumber: true })}
        error={errors.meanWeightG?.message}
      />
      <SelectField label="Status" {...form.register('status')} error={errors.status?.message}>
        {BATCH_STATUSES.map((s) => (
          <option key={s} value={s}>
            {BATCH_STATUS_LABELS[s]}
          </option>
        ))}
      </SelectField>
      <Controller
        control={form.control}
        name="tankIds"
        render={({ field, fieldState }) => <TankPicker tanks={tanks} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />}
      />
    </FormShell>
  )
}
