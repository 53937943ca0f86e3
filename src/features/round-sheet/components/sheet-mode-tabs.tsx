import { clsx } from 'clsx'
import { Keyboard, Printer, type LucideIcon } from 'lucide-react'

export const SHEET_MODES = ['print', 'enter'] as const
export type SheetMode = (typeof SHEET_MODES)[number]

const MODES: Record<SheetMode, { label: string; icon: LucideIcon }> = {
  print: { label: 'Paper sheet', icon: Printer },
  enter: { label: 'Type in a paper sheet', icon: Keyboard },
}

export const parseSheetMode = (value: string | null): SheetMode => SHEET_MODES.find((m) => m === value) ?? 'print'

export function SheetModeTabs({ current, onChange }: { current: SheetMode; onChange: (mode: SheetMode) => void }) {
  return (
    <div role="group" aria-label="Mode" className="inline-flex flex-wrap gap-1 self-start rounded-lg bg-white p-1 ring-1 ring-tide-200 print:hidden">
      {SHEET_MODES.map((mode) => {
        const { label, icon: Icon } = MODES[mode]
        return (
          <button
            key={mode}
            type="button"
            aria-pressed={mode === current}
            onClick={() => onChange(mode)}
            className={clsx(
              'inline-flex min-h-11 items-center gap-2 rounded-md px-3 font-semibold',
              mode === current ? 'bg-tide-700 text-white' : 'text-tide-700 hover:bg-tide-50',
            )}
          >
            <Icon aria-hidden className="size-4" /> {label}
          </button>
        )
      })}
    </div>
  )
}
