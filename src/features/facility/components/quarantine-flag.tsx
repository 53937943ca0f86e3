import { ShieldAlert } from 'lucide-react'

export function QuarantineFlag() {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded-full bg-tide-900 px-2 py-0.5 text-xs font-semibold text-white">
      <ShieldAlert aria-hidden className="size-3.5" /> Quarantine
    </span>
  )
}
