import { clsx } from 'clsx'
import { CircleCheck, Info, TriangleAlert } from 'lucide-react'
import type { ReactNode } from 'react'

const TONES = {
  ok: { icon: CircleCheck, box: 'border-kelp-100 bg-kelp-50 text-kelp-700', label: 'OK' },
  watch: { icon: TriangleAlert, box: 'border-ember-100 bg-ember-50 text-ember-700', label: 'Check' },
  info: { icon: Info, box: 'border-tide-100 bg-tide-50 text-tide-800', label: '' },
} as const

/** A message with an icon and a word for its tone, so it never rests on colour alone. */
export function Notice({ tone, children }: { tone: keyof typeof TONES; children: ReactNode }) {
  const t = TONES[tone]
  return (
    <div className={clsx('flex items-start gap-2 rounded-lg border p-3 text-sm', t.box)}>
      <t.icon aria-hidden className="mt-0.5 size-4 shrink-0" />
      <p className="text-tide-900">
        {t.label && <strong className={clsx('mr-1', t.box.split(' ').at(-1))}>{t.label}:</strong>}
        {children}
      </p>
    </div>
  )
}
