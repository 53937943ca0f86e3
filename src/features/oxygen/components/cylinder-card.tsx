import { useState } from 'react'
import type { CylinderStatus } from '#shared/schemas/oxygen'
import { formatHours, formatInstant } from '../utils/format'
import { LevelLabel } from './level-label'
import { ReadingForm } from './reading-form'
import { ReplaceTaskNotice } from './replace-task-notice'

function Fact({ label, value, testId }: { label: string; value: string; testId?: string }) {
  return (
    <div>
      <dt className="text-sm text-tide-600">{label}</dt>
      <dd className="font-semibold tabular-nums text-tide-900" data-testid={testId}>
        {value}
      </dd>
    </div>
  )
}

export function CylinderCard({ cylinder, zone, canRead }: { cylinder: CylinderStatus; zone: string; canRead: boolean }) {
  const [justRaised, setJustRaised] = useState<number | null>(null)
  const c = cylinder
  return (
    <li aria-label={`${c.code} ${c.label}`} className="flex flex-col gap-3 rounded-xl border border-tide-200 bg-white p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <p className="text-lg font-bold text-tide-900">{c.code}</p>
          <p className="text-sm text-tide-700">{c.label}</p>
        </div>
        <LevelLabel level={c.level} />
      </div>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
        <Fact label="To reserve" value={c.hoursToReserve === null ? '–' : formatHours(c.hoursToReserve)} testId="hours-to-reserve" />
        <Fact label="Gas left" value={c.gasLeftL === null ? '–' : `${c.gasLeftL.toLocaleString('en-GB')} L`} />
        <Fact label="Last reading" value={c.lastPressure === null ? 'None yet' : `${c.lastPressure} ${c.unit} at ${c.flowLPerMin} L/min`} />
        <Fact label="Read" value={c.lastReadAt ? formatInstant(c.lastReadAt, zone) : '–'} />
      </dl>
      <p className="text-sm text-tide-600">
        Reserve pressure {c.reservePressure} {c.unit}; hours count down to it, not to empty.
      </p>
      <ReplaceTaskNotice status={c} fresh={justRaised !== null && justRaised === c.replaceTaskId} />
      {canRead && <ReadingForm cylinder={c} onSaved={(status) => setJustRaised(c.replaceTaskId === null ? status.replaceTaskId : null)} />}
    </li>
  )
}
