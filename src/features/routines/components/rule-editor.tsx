import { TriangleAlert } from 'lucide-react'
import { Fragment, useState } from 'react'
import { useFormContext, useWatch } from 'react-hook-form'
import { validateRule } from '#shared/schedule/describe-rule'
import type { RoutineInput } from '#shared/schemas/routine'
import { Field } from '../../../components/ui/field'
import { dateOf, joinStart, NEW_ROUTINE_TIME, timeOf } from '../utils/routine-form-values'
import { buildDraft, defaultDraft, draftOfRule, type RuleDraft } from '../utils/rule-spec'
import { RuleBuilder } from './rule-builder'
import { RuleModeSwitch, type RuleMode } from './rule-mode-switch'
import { StartFields } from './start-fields'

const isTime = (t: string) => /^([01]\d|2[0-3]):[0-5]\d$/.test(t)

export function RuleEditor() {
  const {
    register,
    setValue,
    getValues,
    formState: { errors, isSubmitted },
  } = useFormContext<RoutineInput>()
  const rrule = useWatch<RoutineInput, 'rrule'>({ name: 'rrule' }) ?? ''
  const startTime = () => timeOf(getValues('dtstart')) || NEW_ROUTINE_TIME
  const [initial] = useState(() => draftOfRule(getValues('rrule'), startTime()))
  const [mode, setMode] = useState<RuleMode>(initial ? 'builder' : 'raw')
  const [draft, setDraft] = useState<RuleDraft>(() => initial ?? defaultDraft(startTime()))
  const [builderError, setBuilderError] = useState<string | null>(null)
  const [note, setNote] = useState<string | null>(null)
  const options = { shouldDirty: true, shouldValidate: isSubmitted }

  function changeDraft(next: RuleDraft) {
    setDraft(next)
    const built = buildDraft(next)
    setBuilderError(built.error)
    setValue('rrule', built.rrule ?? '', options)
    const first = next.times.filter(isTime).sort()[0]
    if (first) setValue('dtstart', joinStart(dateOf(getValues('dtstart')), first), options)
  }

  function changeMode(next: RuleMode) {
    setNote(null)
    if (next === 'raw' || next === mode) return setMode(next)
    const fromRule = draftOfRule(rrule, startTime())
    if (!fromRule) return setNote('The builder cannot show this rule, so keep editing it as written.')
    setDraft(fromRule)
    setBuilderError(null)
    setMode('builder')
  }

  const liveError = mode === 'builder' ? builderError : rrule.trim() ? validateRule(rrule) : null
  const message = liveError ?? errors.rrule?.message

  return (
    <div className="grid gap-4">
      <RuleModeSwitch mode={mode} onChange={changeMode} />
      {note && <p className="text-sm font-semibold text-ember-700">{note}</p>}
      {mode === 'builder' ? (
        <RuleBuilder draft={draft} onChange={changeDraft} />
      ) : (
        <Field
          label="Written rule (RRULE)"
          autoCapitalize="characters"
          autoComplete="off"
          spellCheck={false}
          className="[&_input]:font-mono"
          hint="RFC 5545, e.g. FREQ=MONTHLY;BYDAY=1TU;BYHOUR=10;BYMINUTE=0. Without BYHOUR the start time is used."
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? 'routine-rule-error' : undefined}
          {...register('rrule')}
        />
      )}
      <div aria-live="polite" className="empty:-mt-4">
        {message && (
          <p id="routine-rule-error" className="flex items-start gap-2 rounded-lg bg-alarm-50 p-3 text-sm font-semibold text-alarm-700">
            <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0" /> {message}
          </p>
        )}
      </div>
      {mode === 'builder' && rrule && (
        <p className="text-sm text-tide-600">
          Written as{' '}
          <code className="rounded bg-tide-50 px-1 text-tide-800">
            {rrule.split(';').map((part, i) => (
              <Fragment key={i}>
                {i > 0 && (
                  <>
                    ;<wbr />
                  </>
                )}
                {part}
              </Fragment>
            ))}
          </code>
        </p>
      )}
      <StartFields timeFollowsRule={mode === 'builder'} />
    </div>
  )
}
