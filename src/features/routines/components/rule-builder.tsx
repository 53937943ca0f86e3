import type { Weekday } from '#shared/schedule/build-rule'
import { Field } from '../../../components/ui/field'
import { RULE_KIND_LABELS, WEEKDAYS, type NthWeek, type RuleDraft, type RuleKind } from '../utils/rule-spec'
import { SelectField } from '../../../components/ui/select-field'
import { TimeList } from './time-list'
import { WeekdayPicker } from './weekday-picker'

const NTH_LABELS: Array<[NthWeek, string]> = [
  [1, '1st'],
  [2, '2nd'],
  [3, '3rd'],
  [4, '4th'],
  [-1, 'Last'],
]
const MONTH_DAYS = Array.from({ length: 31 }, (_, i) => i + 1)

export function RuleBuilder({ draft, onChange }: { draft: RuleDraft; onChange: (draft: RuleDraft) => void }) {
  const patch = (change: Partial<RuleDraft>) => onChange({ ...draft, ...change })
  const { kind } = draft
  return (
    <div className="grid gap-4">
      <SelectField label="Repeats" value={kind} onChange={(e) => patch({ kind: e.target.value as RuleKind })}>
        {Object.entries(RULE_KIND_LABELS).map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
      {(kind === 'everyNDays' || kind === 'everyNWeeksOnDays') && (
        <Field
          label={kind === 'everyNDays' ? 'Every how many days' : 'Every how many weeks'}
          type="number"
          inputMode="numeric"
          min={1}
          max={365}
          value={Number.isNaN(draft.interval) ? '' : draft.interval}
          onChange={(e) => patch({ interval: e.target.valueAsNumber })}
          className="max-w-48"
        />
      )}
      {(kind === 'weeklyOnDays' || kind === 'everyNWeeksOnDays') && <WeekdayPicker value={draft.days} onChange={(days) => patch({ days })} />}
      {kind === 'monthlyOnNthWeekday' && (
        <div className="grid grid-cols-2 gap-3">
          <SelectField label="Which one" value={draft.nth} onChange={(e) => patch({ nth: Number(e.target.value) as NthWeek })}>
            {NTH_LABELS.map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </SelectField>
          <SelectField label="Weekday" value={draft.day} onChange={(e) => patch({ day: e.target.value as Weekday })}>
            {WEEKDAYS.map((d) => (
              <option key={d.code} value={d.code}>
                {d.long}
              </option>
            ))}
          </SelectField>
        </div>
      )}
      {kind === 'monthlyOnDayOfMonth' && (
        <SelectField
          label="Day of the month"
          value={draft.dayOfMonth}
          onChange={(e) => patch({ dayOfMonth: Number(e.target.value) })}
          hint={draft.dayOfMonth > 28 ? 'Months without this day are left out.' : undefined}
          className="max-w-48"
        >
          {MONTH_DAYS.map((d) => (
            <option key={d} value={d}>
              {d}
            </option>
          ))}
          <option value={-1}>Last day</option>
        </SelectField>
      )}
      <TimeList times={draft.times} onChange={(times) => patch({ times })} />
    </div>
  )
}
