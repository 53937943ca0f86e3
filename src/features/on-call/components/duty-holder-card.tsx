import { Mail, Phone, PhoneOff, UserRound } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { OnCallSummary } from '../api/on-call-queries'
import { formatWhen } from '../../../lib/zone-format'

const bigLink = 'inline-flex min-h-12 items-center justify-center gap-2 rounded-lg px-4 font-semibold'

/** Who holds the phone now, until when, and the two ways to reach them. */
export function DutyHolderCard({ now, next, timeZone, canPlan }: Pick<OnCallSummary, 'now' | 'next'> & { timeZone: string; canPlan: boolean }) {
  return (
    <section aria-labelledby="on-call-now" className="rounded-xl bg-tide-900 p-5 text-white">
      <h2 id="on-call-now" className="text-sm font-semibold tracking-wide text-tide-200 uppercase">
        On call now
      </h2>
      {now ? (
        <>
          <p className="mt-1 flex items-center gap-2 text-2xl font-bold">
            <UserRound aria-hidden className="size-6 text-tide-300" /> {now.personName}
          </p>
          <p className="mt-1 text-tide-100">Until {formatWhen(now.endsAt, timeZone)}</p>
          <div className="mt-4 grid gap-2 sm:flex">
            {now.phone ? (
              <a href={`tel:${now.phone.replace(/[^\d+]/g, '')}`} className={`${bigLink} bg-white text-tide-900 hover:bg-tide-50`}>
                <Phone aria-hidden className="size-5" /> Call {now.phone}
              </a>
            ) : (
              <p className="flex items-center gap-2 text-tide-100">
                <PhoneOff aria-hidden className="size-5" /> No phone number on file
              </p>
            )}
            {now.email && (
              <a href={`mailto:${now.email}`} className={`${bigLink} ring-1 ring-tide-400 hover:bg-tide-800`}>
                <Mail aria-hidden className="size-5" /> E-mail {now.personName.split(' ')[0]}
              </a>
            )}
          </div>
        </>
      ) : (
        <div className="mt-1">
          <p className="flex items-center gap-2 text-xl font-bold">
            <PhoneOff aria-hidden className="size-6 text-ember-100" /> Nobody is on call
          </p>
          <p className="mt-1 text-tide-100">
            {canPlan ? (
              <>
                Add duty on the{' '}
                <Link to="/roster" className="font-semibold text-white underline">
                  Roster
                </Link>
                .
              </>
            ) : (
              'Ask a supervisor to add duty on the Roster.'
            )}
          </p>
        </div>
      )}
      <p className="mt-4 border-t border-tide-700 pt-3 text-sm text-tide-100">
        {next ? (
          <>
            Next: <span className="font-semibold text-white">{next.personName}</span> from {formatWhen(next.startsAt, timeZone)}
          </>
        ) : (
          'Nobody is rostered next in the coming two weeks.'
        )}
      </p>
      <p className="mt-1 text-xs text-tide-300">Times are facility time ({timeZone}).</p>
    </section>
  )
}
