import { clsx } from 'clsx'
import { CalendarPlus, Phone, Repeat, Shuffle, type LucideIcon } from 'lucide-react'
import { forwardRef } from 'react'
import type { StaffMember } from '#shared/schemas/person'
import type { OnCallDuty, Shift } from '#shared/schemas/roster'
import { DutyForm } from './duty-form'
import { DutyList } from './duty-list'
import { PatternForm } from './pattern-form'
import { RotationForm } from './rotation-form'
import { ShiftForm } from './shift-form'

export type PlannerTab = 'shift' | 'pattern' | 'duty' | 'rotation'
export type ShiftTarget = { shift: Shift | null; personId: number | null; date: string }

const TABS: Array<{ id: PlannerTab; label: string; icon: LucideIcon }> = [
  { id: 'shift', label: 'Shift', icon: CalendarPlus },
  { id: 'pattern', label: 'Weekly pattern', icon: Repeat },
  { id: 'duty', label: 'On-call duty', icon: Phone },
  { id: 'rotation', label: 'Rotation', icon: Shuffle },
]

type Props = {
  tab: PlannerTab
  onTab: (tab: PlannerTab) => void
  shiftTarget: ShiftTarget
  onShiftDone: () => void
  staff: StaffMember[]
  from: string
  duties: OnCallDuty[]
  handoverTime: string | null
}

/** The roster's forms, one at a time: a single shift, a weekly pattern, an on-call duty, or a rotation. */
export const RosterPlanner = forwardRef<HTMLElement, Props>(function RosterPlanner(
  { tab, onTab, shiftTarget, onShiftDone, staff, from, duties, handoverTime },
  ref,
) {
  return (
    <section ref={ref} aria-label="Plan the roster" className="scroll-mt-4 rounded-xl border border-tide-200 bg-white">
      <div className="flex overflow-x-auto border-b border-tide-200">
        {TABS.map((t) => (
          <button
            key={t.id}
            type="button"
            aria-pressed={tab === t.id}
            onClick={() => onTab(t.id)}
            className={clsx(
              'flex min-h-12 shrink-0 items-center gap-2 border-b-3 px-4 font-semibold',
              tab === t.id ? 'border-tide-700 text-tide-900' : 'border-transparent text-tide-600 hover:text-tide-900',
            )}
          >
            <t.icon aria-hidden className="size-5" /> {t.label}
          </button>
        ))}
      </div>
      <div className="p-4">
        {tab === 'shift' && (
          <ShiftForm
            key={`${shiftTarget.shift?.id ?? 'new'}-${shiftTarget.personId}-${shiftTarget.date}`}
            shift={shiftTarget.shift}
            initial={shiftTarget}
            staff={staff}
            onDone={onShiftDone}
          />
        )}
        {tab === 'pattern' && <PatternForm staff={staff} from={from} />}
        {tab === 'duty' && (
          <div className="flex flex-col gap-4">
            <DutyForm staff={staff} from={from} handoverTime={handoverTime} />
            <DutyList duties={duties} />
          </div>
        )}
        {tab === 'rotation' && <RotationForm staff={staff} from={from} />}
      </div>
    </section>
  )
})
