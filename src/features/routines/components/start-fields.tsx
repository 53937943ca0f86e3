import { useFormContext, useWatch } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { Field } from '../../../components/ui/field'
import { dateOf, joinStart, timeOf } from '../utils/routine-form-values'

/** dtstart as two inputs; in the builder the time follows the first time of day. */
export function StartFields({ timeFollowsRule }: { timeFollowsRule: boolean }) {
  const {
    setValue,
    formState: { errors, isSubmitted },
  } = useFormContext<RoutineInput>()
  const dtstart = useWatch<RoutineInput, 'dtstart'>({ name: 'dtstart' }) ?? ''
  const date = dateOf(dtstart)
  const time = timeOf(dtstart)
  const set = (nextDate: string, nextTime: string) => setValue('dtstart', joinStart(nextDate, nextTime), { shouldDirty: true, shouldValidate: isSubmitted })

  return (
    <div className="grid grid-cols-2 gap-3">
      <Field
        label="Starts on"
        type="date"
        value={date}
        onChange={(e) => set(e.target.value, time)}
        error={errors.dtstart ? 'Choose a start date and time' : undefined}
      />
      <Field
        label="Start time"
        type="time"
        value={time}
        readOnly={timeFollowsRule}
        onChange={(e) => set(date, e.target.value)}
        hint={timeFollowsRule ? 'Follows the first time of day.' : 'Used when the rule gives no time.'}
        className={timeFollowsRule ? '[&_input]:bg-tide-50 [&_input]:text-tide-700' : undefined}
      />
    </div>
  )
}
