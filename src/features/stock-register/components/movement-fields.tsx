import { get, type UseFormReturn } from 'react-hook-form'
import { OTHER_CAUSE, UNKNOWN_CAUSE, type Movement } from '#shared/schemas/stock'
import { Field } from '../../../components/ui/field'
import { SelectField } from '../../../components/ui/select-field'
import type { MovementFormValues } from '../utils/movement-form'

export interface Choice {
  id: number
  label: string
}

interface Props {
  form: UseFormReturn<MovementFormValues>
  tanks: Choice[]
  causes: string[]
  /** This batch's movements, for the one a correction points at. */
  correctable: Movement[]
}

const FROM = new Set(['transfer', 'grading', 'mortality', 'cull', 'sampling', 'dispatch'])
const TO = new Set(['arrival', 'transfer', 'grading'])
const WEIGHT = TO

/** The fields the chosen kind needs, and only those. */
export function MovementFields({ form, tanks, causes, correctable }: Props) {
  const { register, watch, formState } = form
  const kind = watch('kind')
  const cause = watch('cause')
  const error = (name: string) => (get(formState.errors, name) as { message?: string } | undefined)?.message
  const num = { inputMode: 'decimal' as const, autoComplete: 'off' }
  const tankOptions = (
    <>
      <option value="">Choose a tank…</option>
      {tanks.map((t) => (
        <option key={t.id} value={t.id}>
          {t.label}
        </option>
      ))}
    </>
  )
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      {FROM.has(kind) && (
        <SelectField label="From tank" error={error('fromTankId')} {...register('fromTankId')}>
          {tankOptions}
        </SelectField>
      )}
      {TO.has(kind) && (
        <SelectField label="To tank" error={error('toTankId')} {...register('toTankId')}>
          {tankOptions}
        </SelectField>
      )}
      {kind === 'correction' ? (
        <>
          <SelectField label="Tank" error={error('tankId')} {...register('tankId')}>
            {tankOptions}
          </SelectField>
          <Field label="Change in count (+ adds, − takes off)" {...num} error={error('delta')} {...register('delta')} />
          <SelectField label="Corrects entry (optional)" error={error('correctsId')} {...register('correctsId')}>
            <option value="">None: a count found wrong</option>
            {correctable
              .filter((m) => m.kind !== 'correction')
              .map((m) => (
                <option key={m.id} value={m.id}>
                  #{m.id} {m.kind}, {m.count} fish
                </option>
              ))}
          </SelectField>
        </>
      ) : (
        <Field label="Number of fish" {...num} error={error('count')} {...register('count')} />
      )}
      {WEIGHT.has(kind) && <Field label="Mean weight (g, optional)" {...num} error={error('meanWeightG')} {...register('meanWeightG')} />}
      {kind === 'arrival' && (
        <>
          <Field label="Origin" error={error('origin')} {...register('origin')} />
          <Field label="Supplier permit (optional)" error={error('permitRef')} {...register('permitRef')} />
          <Field label="Health certificate (optional)" error={error('healthCertificateRef')} {...register('healthCertificateRef')} />
          <fieldset className="grid grid-cols-3 gap-2 sm:col-span-2">
            <legend className="mb-1 text-sm font-semibold text-tide-800">Transport water (optional)</legend>
            <Field label="Temp. (°C)" {...num} error={error('transportWater.tempC')} {...register('transportWater.tempC')} />
            <Field label="pH" {...num} error={error('transportWater.pH')} {...register('transportWater.pH')} />
            <Field label="DO (mg/L)" {...num} error={error('transportWater.doMgL')} {...register('transportWater.doMgL')} />
          </fieldset>
        </>
      )}
      {kind === 'mortality' && (
        <>
          <SelectField label="Cause of death" error={error('cause')} {...register('cause')}>
            <option value={UNKNOWN_CAUSE}>Unknown</option>
            {causes.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
            <option value={OTHER_CAUSE}>Other (say what)</option>
          </SelectField>
          {cause === OTHER_CAUSE && <Field label="What was the cause?" error={error('causeText')} {...register('causeText')} />}
          <label className="flex min-h-11 items-center gap-3 sm:col-span-2">
            <input type="checkbox" className="size-5" {...register('necropsy')} />
            <span className="text-tide-900">Kept for necropsy</span>
          </label>
        </>
      )}
      {(kind === 'cull' || kind === 'sampling' || kind === 'correction') && (
        <Field label={kind === 'sampling' ? 'Sampled for' : 'Reason'} className="sm:col-span-2" error={error('reason')} {...register('reason')} />
      )}
      {kind === 'dispatch' && <Field label="Destination" className="sm:col-span-2" error={error('destination')} {...register('destination')} />}
    </div>
  )
}
