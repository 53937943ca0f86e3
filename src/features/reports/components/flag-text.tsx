import { BAND_LOOK } from '../../../components/ui/band-badge'
import { STATUS_LOOK } from '../../../components/ui/task-status-label'

const FLAGS = {
  watch: { ...BAND_LOOK.watch, tone: BAND_LOOK.watch.text },
  critical: { ...BAND_LOOK.critical, tone: BAND_LOOK.critical.text },
  missed: STATUS_LOOK.missed,
} as const

/** A flag or a miss as icon + word (the same words as the badges and statuses elsewhere); anything else as plain text. */
export function FlagText({ flag }: { flag: string }) {
  const f = FLAGS[flag as keyof typeof FLAGS]
  if (!f) return <>{flag || '—'}</>
  return (
    <span className={`inline-flex items-center gap-1 font-semibold ${f.tone}`}>
      <f.icon aria-hidden className="size-4" /> {f.label}
    </span>
  )
}
