import { clsx } from 'clsx'
import { Loader2, Radio, RefreshCw, WifiOff } from 'lucide-react'
import { useLiveStatus } from '../hooks/use-live-status'

const LOOK = {
  connecting: { label: 'Connecting…', icon: Loader2, spin: true, className: 'bg-tide-100 text-tide-700' },
  live: { label: 'Live', icon: Radio, spin: false, className: 'bg-kelp-50 text-kelp-700 ring-1 ring-kelp-500/30' },
  reconnecting: { label: 'Reconnecting…', icon: RefreshCw, spin: true, className: 'bg-ember-50 text-ember-700 ring-1 ring-ember-500/40' },
  offline: { label: 'Offline', icon: WifiOff, spin: false, className: 'bg-tide-800 text-white' },
}

/** Whether changes by others arrive live; always icon + word. */
export function ConnectionIndicator() {
  const status = useLiveStatus()
  if (status === 'signed-out') return null
  const { label, icon: Icon, spin, className } = LOOK[status]
  return (
    <p
      role="status"
      aria-label={`Connection: ${label}`}
      className={clsx('inline-flex shrink-0 items-center gap-1.5 rounded-full px-3 py-1 text-sm font-semibold', className)}
    >
      <Icon aria-hidden className={clsx('size-4', spin && 'animate-spin')} /> {label}
    </p>
  )
}
