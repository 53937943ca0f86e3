import { clsx } from 'clsx'
import { Info, TriangleAlert } from 'lucide-react'
import type { ReactNode } from 'react'

const TONES = {
  watch: { icon: TriangleAlert, box: 'border-ember-100 bg-ember-50', word: 'Check', wordTone: 'text-ember-700' },
  info: { icon: Info, box: 'border-tide-100 bg-tide-50', word: '', wordTone: 'text-tide-700' },
} as const

/** A message with an icon and a word for its tone, so it never rests on colour alone. */
export function Notice({ tone, children }: { tone: keyof typeof TONES; children: ReactNode }) {
  const t = TONES[tone]
  return (
    <div className={clsx('flex items-start gap-2 rounded-lg border p-3 text-sm text-tide-900', t.box)}>
      <t.icon aria-hidden className={clsx('mt-0.5 size-4 shrink-0', t.wordTone)} />
      <p>
        {t.word && <strong className={clsx('mr-1', t.wordTone)}>{t.word}:</strong>}
        {children}
      </p>
    </div>
  )
}
