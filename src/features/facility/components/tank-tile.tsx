import { clsx } from 'clsx'
import type { Tank } from '#shared/schemas/facility'
import { formatLitres } from '../utils/format'
import { TankUseStatus } from './tank-use-status'

export function TankTile({ tank }: { tank: Tank }) {
  return (
    <li
      className={clsx(
        'flex min-h-11 flex-col rounded-lg border px-3 py-2 text-sm',
        tank.inUse ? 'border-tide-200 bg-tide-50' : 'border-dashed border-tide-300 bg-white',
      )}
    >
      <span className="flex items-baseline justify-between gap-2">
        <span className="font-bold text-tide-900">{tank.code}</span>
        <span className="text-xs text-tide-600">{tank.kind === 'bin' ? 'Bin' : 'Tank'}</span>
      </span>
      <span className="truncate text-tide-800" title={tank.name}>
        {tank.name}
      </span>
      <span className="mt-1 flex flex-wrap items-center justify-between gap-x-2 text-tide-700">
        <span className="tabular-nums">{formatLitres(tank.volumeL)}</span>
        <TankUseStatus inUse={tank.inUse} />
      </span>
    </li>
  )
}
