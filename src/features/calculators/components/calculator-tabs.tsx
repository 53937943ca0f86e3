import { clsx } from 'clsx'
import { Cylinder, FlaskConical, Utensils, type LucideIcon } from 'lucide-react'
import { Link } from 'react-router-dom'

export const CALCULATORS = ['bath', 'cylinder', 'ration'] as const
export type CalculatorName = (typeof CALCULATORS)[number]

const TABS: Record<CalculatorName, { label: string; icon: LucideIcon }> = {
  bath: { label: 'Bath dose', icon: FlaskConical },
  cylinder: { label: 'Oxygen cylinder', icon: Cylinder },
  ration: { label: 'Daily ration', icon: Utensils },
}

export function CalculatorTabs({ current }: { current: CalculatorName }) {
  return (
    <nav aria-label="Calculators" className="flex flex-wrap gap-2">
      {CALCULATORS.map((name) => {
        const t = TABS[name]
        return (
          <Link
            key={name}
            to={`/calculators?tool=${name}`}
            replace
            aria-current={name === current ? 'page' : undefined}
            className={clsx(
              'inline-flex min-h-11 items-center gap-2 rounded-lg border px-4 font-semibold',
              name === current ? 'border-tide-700 bg-tide-700 text-white' : 'border-tide-200 bg-white text-tide-800 hover:bg-tide-50',
            )}
          >
            <t.icon aria-hidden className="size-5" /> {t.label}
          </Link>
        )
      })}
    </nav>
  )
}
