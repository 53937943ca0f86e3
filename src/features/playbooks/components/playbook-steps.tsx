import { CATEGORY_LABELS } from '#shared/schemas/routine'
import type { PlaybookStep } from '#shared/schemas/playbook'
import { describeStepTiming } from '../utils/step-words'

/** A playbook's steps in plain words, in the order they were written. */
export function PlaybookSteps({ steps }: { steps: PlaybookStep[] }) {
  return (
    <ol className="divide-y divide-tide-100">
      {steps.map((step, index) => (
        <li key={index} className="grid gap-x-4 gap-y-0.5 py-2 sm:grid-cols-[minmax(0,14rem)_minmax(0,1fr)]">
          <span className="font-semibold text-tide-900">{describeStepTiming(step)}</span>
          <span className="min-w-0">
            <span className="text-tide-900">{step.title}</span>
            <span className="block text-sm text-tide-600">
              {CATEGORY_LABELS[step.category]} · {step.perTank ? 'each tank' : 'once for the event'} · {step.durationMinutes} min
              {step.priority === 'welfare_critical' && ' · welfare-critical'}
            </span>
          </span>
        </li>
      ))}
    </ol>
  )
}
