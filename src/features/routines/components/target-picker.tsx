import { useController, useFormContext, useWatch } from 'react-hook-form'
import { TARGET_KINDS, type RoutineInput, type TargetKind } from '#shared/schemas/routine'
import { Button } from '../../../components/ui/button'
import { LoadingState } from '../../../components/ui/page-state'
import { useTargetOptions } from '../api/use-target-options'
import { TARGET_KIND_LABELS } from '../utils/target-text'
import { CheckboxList } from './checkbox-list'
import { FormSection } from './form-section'
import { SelectField } from '../../../components/ui/select-field'

export function TargetPicker() {
  const {
    register,
    setValue,
    formState: { errors },
  } = useFormContext<RoutineInput>()
  const kind = useWatch<RoutineInput, 'targetKind'>({ name: 'targetKind' })
  const { field: ids } = useController<RoutineInput, 'targetIds'>({ name: 'targetIds' })
  const targets = useTargetOptions(kind)
  const kindField = register('targetKind', {
    // ids of one kind mean nothing for another
    onChange: () => setValue('targetIds', [], { shouldDirty: true }),
  })

  return (
    <FormSection title="Where" description="Which targets get a task each time the routine comes round.">
      <SelectField label="Target kind" {...kindField}>
        {TARGET_KINDS.map((k: TargetKind) => (
          <option key={k} value={k}>
            {TARGET_KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      {kind === 'facility' && <p className="text-tide-700">One task for the whole facility each time.</p>}
      {kind !== 'facility' && targets.status === 'pending' && <LoadingState label="Loading the choices…" />}
      {kind !== 'facility' && targets.status === 'error' && (
        <div role="alert" className="flex flex-wrap items-center gap-3 text-alarm-700">
          Could not load the choices: {targets.error?.message}
          <Button type="button" variant="secondary" onClick={targets.retry}>
            Try again
          </Button>
        </div>
      )}
      {kind !== 'facility' && targets.status === 'success' && (
        <CheckboxList
          label={kind === 'area_tanks' ? 'Areas whose tanks are included' : TARGET_KIND_LABELS[kind]}
          options={targets.options}
          value={ids.value ?? []}
          onChange={ids.onChange}
          error={errors.targetIds?.message}
        />
      )}
      {(kind === 'tank' || kind === 'area_tanks') && (
        <label className="flex min-h-11 items-center gap-3 text-tide-800">
          <input type="checkbox" className="size-5" {...register('onlyInUse')} />
          Only tanks in use (empty tanks get no tasks)
        </label>
      )}
    </FormSection>
  )
}
