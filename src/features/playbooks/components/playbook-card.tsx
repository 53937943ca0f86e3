import { BookOpen, Pencil, UtensilsCrossed } from 'lucide-react'
import { FASTING_KINDS, type Playbook } from '#shared/schemas/playbook'
import { Button } from '../../../components/ui/button'
import { EVENT_KIND_LABELS } from '../utils/kind-labels'
import { PlaybookSteps } from './playbook-steps'

export function PlaybookCard({ playbook, onEdit }: { playbook: Playbook; onEdit?: () => void }) {
  const fasts = FASTING_KINDS.includes(playbook.kind) && playbook.fastingHours > 0
  return (
    <article aria-labelledby={`playbook-${playbook.id}`} className="rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 id={`playbook-${playbook.id}`} className="flex items-center gap-2 text-lg font-bold text-tide-900">
            <BookOpen aria-hidden className="size-5 shrink-0 text-tide-600" /> {playbook.name}
          </h3>
          <p className="mt-0.5 flex flex-wrap gap-x-3 text-sm text-tide-700">
            <span>{EVENT_KIND_LABELS[playbook.kind]}</span>
            <span>
              {playbook.steps.length} {playbook.steps.length === 1 ? 'step' : 'steps'}
            </span>
            {fasts && (
              <span className="inline-flex items-center gap-1">
                <UtensilsCrossed aria-hidden className="size-4" /> Feeding held {playbook.fastingHours} h before
              </span>
            )}
          </p>
        </div>
        {onEdit && (
          <Button variant="secondary" onClick={onEdit} aria-label={`Edit ${playbook.name}`}>
            <Pencil aria-hidden className="size-4" /> Edit steps
          </Button>
        )}
      </header>
      {playbook.description && <p className="mt-2 max-w-3xl text-tide-800">{playbook.description}</p>}
      <div className="mt-3">
        <PlaybookSteps steps={playbook.steps} />
      </div>
    </article>
  )
}
