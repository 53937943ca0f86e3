import { clsx } from 'clsx'
import { CircleDashed, Droplets } from 'lucide-react'

export function TankUseStatus({ inUse, className }: { inUse: boolean; className?: string }) {
  return inUse ? (
    <span className={clsx('inline-flex items-center gap-1 whitespace-nowrap font-semibold text-kelp-700', className)}>
      <Droplets aria-hidden className="size-4" /> In use
    </span>
  ) : (
    <span className={clsx('inline-flex items-center gap-1 whitespace-nowrap text-tide-600', className)}>
      <CircleDashed aria-hidden className="size-4" /> Empty
    </span>
  )
}
