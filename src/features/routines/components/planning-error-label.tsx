import { TriangleAlert } from 'lucide-react'

/** Shown on a routine the planner had to skip, with its reason, so a supervisor can fix it. */
export function PlanningErrorLabel({ reason }: { reason: string }) {
  return (
    <span className="inline-flex items-start gap-1 rounded-lg bg-alarm-50 px-2 py-0.5 text-sm font-semibold text-alarm-700">
      <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0" /> {reason}
    </span>
  )
}
