import { CircleAlert, CloudUpload } from 'lucide-react'
import type { ReactNode } from 'react'
import { longDate } from '../utils/format'

interface Props {
  date: string | null
  done: number
  total: number
  waiting: number
  failed: number
  status: ReactNode
  /** While the round loads: keep the date's and the progress line's room, so the list does not jump down when it arrives. */
  reserve?: boolean
}

/** Sticky on the phone so progress and the connection stay in view while walking the round. */
export function RoundHeader({ date, done, total, waiting, failed, status, reserve = false }: Props) {
  const pct = total ? Math.round((done / total) * 100) : 0
  return (
    <header className="sticky top-0 z-10 -mx-4 -mt-4 mb-4 border-b border-tide-200 bg-tide-50/95 px-4 pt-3 pb-3 backdrop-blur md:-mx-8 md:-mt-8 md:px-8 md:pt-6">
      <div className="mx-auto max-w-2xl">
        <div className="flex items-start justify-between gap-3">
          <div className="min-w-0">
            <h1 className="text-2xl font-bold text-tide-900">Round</h1>
            {(date || reserve) && <p className="text-tide-700">{date ? longDate(date) : '\u00a0'}</p>}
          </div>
          {status}
        </div>
        {(total > 0 || reserve) && (
          <div className={total > 0 ? 'mt-2' : 'invisible mt-2'} aria-hidden={total > 0 ? undefined : true}>
            <div
              role="progressbar"
              aria-label="Round progress"
              aria-valuemin={0}
              aria-valuemax={total}
              aria-valuenow={done}
              aria-valuetext={`${done} of ${total} done`}
              className="h-3 overflow-hidden rounded-full bg-tide-200"
            >
              <div className="h-full rounded-full bg-kelp-500 transition-[width]" style={{ width: `${pct}%` }} />
            </div>
            <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
              <span className="font-bold text-tide-900">
                {done} of {total} done
              </span>
              {waiting > 0 && (
                <span className="inline-flex items-center gap-1 font-semibold text-tide-800">
                  <CloudUpload aria-hidden className="size-4" /> {waiting} waiting to send
                </span>
              )}
              {failed > 0 && (
                <span className="inline-flex items-center gap-1 font-semibold text-alarm-700">
                  <CircleAlert aria-hidden className="size-4" /> {failed} not sent
                </span>
              )}
            </p>
          </div>
        )}
      </div>
    </header>
  )
}
