import { useQuery } from '@tanstack/react-query'
import { ShieldAlert } from 'lucide-react'
import type { Area, Tank } from '#shared/schemas/facility'
import { labelQueries } from '../api/label-queries'
import { tankAddress } from '../api/tank-address'

/** One label to stick on a tank: its code and name large, the QR code that opens its page, and the address in words. */
export function TankLabel({ tank, area }: { tank: Tank; area: Area | undefined }) {
  const url = tankAddress(tank.id)
  const qr = useQuery(labelQueries.qr(url))
  return (
    <li className="tank-label flex items-center gap-4 rounded-xl border-2 border-dashed border-tide-300 bg-white p-4 print:rounded-none print:border-tide-900">
      <div className="size-32 shrink-0 md:size-36 print:size-[38mm]">
        {qr.data ? (
          <img src={qr.data} alt={`QR code opening the page of ${tank.code}`} className="size-full [image-rendering:pixelated]" />
        ) : (
          <div role="status" className="flex size-full items-center justify-center bg-tide-50 text-center text-sm text-tide-700">
            {qr.isError ? 'Could not draw the code' : 'Drawing code…'}
          </div>
        )}
      </div>
      <div className="flex min-w-0 flex-col gap-1">
        <p className="break-words text-3xl font-extrabold leading-none tracking-tight text-tide-950 md:text-4xl">{tank.code}</p>
        <p className="break-words text-xl font-bold leading-tight text-tide-900">{tank.name}</p>
        {area && (
          <p className="flex items-center gap-1 text-sm text-tide-800">
            {area.name}
            {area.quarantine && (
              <span className="inline-flex items-center gap-1 font-semibold">
                <ShieldAlert aria-hidden className="size-4" /> Quarantine
              </span>
            )}
          </p>
        )}
        <p className="break-all text-xs text-tide-700">{url}</p>
      </div>
    </li>
  )
}
