import { ArrowDown, ArrowUp, Trash2 } from 'lucide-react'
import { useFormContext } from 'react-hook-form'
import { CATEGORY_LABELS, ROUTINE_CATEGORIES } from '#shared/schemas/routine'
import type { PlaybookInput } from '#shared/schemas/playbook'
import { Field } from '../../../components/ui/field'
import { asNumber, asTimeOrNull } from '../utils/playbook-form-values'
import { describeStepTiming } from '../utils/step-words'
import { SelectField } from '../../../components/ui/select-field'
import { TextAreaField } from '../../../components/ui/text-area-field'

type Props = { index: number; count: number; onMove: (to: number) => void; onRemove: () => void }

const v = (value: number | undefined) => value ?? 0
const iconButton = 'inline-flex size-11 items-center justify-center rounded-lg text-tide-700 hover:bg-tide-100 disabled:text-tide-300'

export function StepFields({ index, count, onMove, onRemove }: Props) {
  const {
    register,
    watch,
    formState: { errors },
  } = useFormContext<PlaybookInput>()
  const step = watch(`steps.${index}`)
  const e = errors.steps?.[index]
  const n = index + 1
  const timingOk = [step.dayOffset, step.minutesOffset, step.repeatDays].every((v) => Number.isInteger(v)) && v(step.repeatDays) >= 1
  return (
    <fieldset className="rounded-lg border border-tide-200 p-3 md:p-4">
      <legend className="px-1 font-semibold text-tide-900">Step {n}</legend>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-semibold text-tide-800" aria-live="polite">
          {timingOk
            ? describeStepTiming({
                dayOffset: v(step.dayOffset),
                time: step.time ?? null,
                minutesOffset: v(step.minutesOffset),
                repeatDays: v(step.repeatDays),
              })
            : 'Timing incomplete'}
        </p>
        <div className="flex">
          <button type="button" className={iconButton} disabled={index === 0} onClick={() => onMove(index - 1)} aria-label={`Move step ${n} up`}>
            <ArrowUp aria-hidden className="size-5" />
          </button>
          <button type="button" className={iconButton} disabled={index === count - 1} onClick={() => onMove(index + 1)} aria-label={`Move step ${n} down`}>
            <ArrowDown aria-hidden className="size-5" />
          </button>
          <button type="button" className={iconButton} disabled={count === 1} onClick={onRemove} aria-label={`Remove step ${n}`}>
            <Trash2 aria-hidden className="size-5" />
          </button>
        </div>
      </div>
      <div className="mt-2 grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Title" className="sm:col-span-2" error={e?.title?.message} {...register(`steps.${index}.title`)} />
        <SelectField label="Category" {...register(`steps.${index}.category`)}>
          {ROUTINE_CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {CATEGORY_LABELS[c]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Priority" {...register(`steps.${index}.priority`)}>
          <option value="routine">Routine</option>
          <option value="welfare_critical">Welfare-critical</option>
        </SelectField>
        <Field
          label="Day (−1 = day before)"
          type="number"
          inputMode="numeric"
          error={e?.dayOffset?.message}
          {...register(`steps.${index}.dayOffset`, { setValueAs: asNumber })}
        />
        <Field
          label="Time of day"
          type="time"
          hint="Empty: count minutes from the start"
          error={e?.time?.message}
          {...register(`steps.${index}.time`, { setValueAs: asTimeOrNull })}
        />
        <Field
          label="Minutes from the start"
          type="number"
          inputMode="numeric"
          readOnly={!!step.time}
          error={e?.minutesOffset?.message}
          {...register(`steps.${index}.minutesOffset`, { setValueAs: asNumber })}
        />
        <Field
          label="Repeat daily for (days)"
          type="number"
          inputMode="numeric"
          min={1}
          error={e?.repeatDays?.message}
          {...register(`steps.${index}.repeatDays`, { setValueAs: asNumber })}
        />
        <Field
          label="Takes (minutes)"
          type="number"
          inputMode="numeric"
          min={1}
          error={e?.durationMinutes?.message}
          {...register(`steps.${index}.durationMinutes`, { setValueAs: asNumber })}
        />
        <Field
          label="Grace (minutes)"
          type="number"
          inputMode="numeric"
          min={0}
          error={e?.graceMinutes?.message}
          {...register(`steps.${index}.graceMinutes`, { setValueAs: asNumber })}
        />
        <label className="flex min-h-11 items-center gap-3 self-end sm:col-span-2">
          <input type="checkbox" className="size-5" {...register(`steps.${index}.perTank`)} />
          <span className="text-tide-900">A task for each tank (otherwise one for the event)</span>
        </label>
        <TextAreaField label="Instructions" className="sm:col-span-2 lg:col-span-4" {...register(`steps.${index}.instructions`)} />
      </div>
    </fieldset>
  )
}
