import { MapPin, Network, QrCode, ShieldAlert } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { TankOverview } from '#shared/schemas/tank-page'

const litres = new Intl.NumberFormat('en', { maximumFractionDigits: 1 })

/** Where the tank sits, what it holds, and the way to its printable label. */
export function TankSummary({ overview }: { overview: TankOverview }) {
  const { tank, area, system } = overview
  return (
    <div className="flex flex-col gap-3 rounded-xl border border-tide-200 bg-white p-4 md:flex-row md:items-start md:justify-between">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm md:grid-cols-[auto_1fr_auto_1fr]">
        <dt className="flex items-center gap-1 font-semibold text-tide-800">
          <MapPin aria-hidden className="size-4" /> Area
        </dt>
        <dd className="text-tide-900">
          {area ? `${area.name} (${area.code})` : 'Unknown area'}
          {area?.quarantine && (
            <span className="ml-2 inline-flex items-center gap-1 font-semibold text-ember-700">
              <ShieldAlert aria-hidden className="size-4" /> Quarantine
            </span>
          )}
        </dd>
        <dt className="flex items-center gap-1 font-semibold text-tide-800">
          <Network aria-hidden className="size-4" /> System
        </dt>
        <dd className="text-tide-900">{system ? `${system.name} (${system.code})` : 'Stand-alone, no shared water'}</dd>
        <dt className="font-semibold text-tide-800">Kind</dt>
        <dd className="text-tide-900">
          {tank.kind === 'bin' ? 'Bin' : 'Tank'}, {litres.format(tank.volumeL)} L
        </dd>
        <dt className="font-semibold text-tide-800">In use</dt>
        <dd className="text-tide-900">{tank.inUse ? 'Yes' : 'No, empty or resting'}</dd>
      </dl>
      <Link
        to={`/labels?tankId=${tank.id}`}
        className="inline-flex min-h-11 items-center justify-center gap-2 self-start rounded-lg bg-white px-4 font-semibold text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50 print:hidden"
      >
        <QrCode aria-hidden className="size-5" /> QR label
      </Link>
    </div>
  )
}
