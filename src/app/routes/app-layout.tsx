import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { clsx } from 'clsx'
import { LogOut, Menu } from 'lucide-react'
import { useState } from 'react'
import { NavLink, Outlet, redirect, useNavigate, type LoaderFunctionArgs } from 'react-router-dom'
import { ROLE_LABELS } from '#shared/schemas/person'
import { authQueries } from '../../features/auth/api/auth-queries'
import { useSignOut } from '../../features/auth/api/use-sign-out'
import { ApiError } from '../../lib/api-client'
import { navFor } from '../navigation'
import { signInPathFrom } from '../query-client'

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    try {
      return await queryClient.ensureQueryData(authQueries.me())
    } catch (error) {
      if (error instanceof ApiError && error.status === 401) {
        throw redirect(signInPathFrom(new URL(request.url)) ?? '/sign-in')
      }
      throw error
    }
  }

export function AppLayout() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const items = navFor(me.role)
  const navigate = useNavigate()
  const signOut = useSignOut()
  const [moreOpen, setMoreOpen] = useState(false)
  const doSignOut = () => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in', { replace: true }) })
  const linkClass = ({ isActive }: { isActive: boolean }) =>
    clsx('flex items-center gap-3 rounded-lg px-3 py-2 font-semibold', isActive ? 'bg-tide-700 text-white' : 'text-tide-100 hover:bg-tide-800')

  return (
    <div className="min-h-dvh md:flex">
      <aside className="hidden w-60 shrink-0 flex-col bg-tide-900 p-4 md:sticky md:top-0 md:flex md:h-dvh">
        <div className="mb-6 flex items-center gap-2 text-xl font-bold text-white">
          <img src="/icon.svg" alt="" className="size-8" /> Roundtide
        </div>
        <nav aria-label="Main" className="flex flex-1 flex-col gap-1">
          {items.map((item) => (
            <NavLink key={item.to} to={item.to} className={linkClass}>
              <item.icon aria-hidden className="size-5" /> {item.label}
            </NavLink>
          ))}
        </nav>
        <div className="border-t border-tide-700 pt-3 text-sm text-tide-100">
          <p className="font-semibold text-white">{me.name}</p>
          <p>{ROLE_LABELS[me.role]}</p>
          <button type="button" onClick={doSignOut} className="mt-2 flex min-h-11 items-center gap-2 font-semibold text-tide-100 hover:text-white">
            <LogOut aria-hidden className="size-4" /> Sign out
          </button>
        </div>
      </aside>

      <main className="min-w-0 flex-1 p-4 pb-24 md:p-8 md:pb-8">
        <Outlet />
      </main>

      <nav aria-label="Main" className="fixed inset-x-0 bottom-0 z-20 border-t border-tide-200 bg-white pb-[env(safe-area-inset-bottom)] md:hidden">
        <ul className="flex">
          {items
            .filter((i) => i.primary)
            .map((item) => (
              <li key={item.to} className="flex-1">
                <NavLink
                  to={item.to}
                  className={({ isActive }) =>
                    clsx('flex min-h-14 flex-col items-center justify-center text-xs font-semibold', isActive ? 'text-tide-800' : 'text-tide-500')
                  }
                >
                  <item.icon aria-hidden className="size-6" /> {item.label}
                </NavLink>
              </li>
            ))}
          <li className="flex-1">
            <button
              type="button"
              aria-expanded={moreOpen}
              onClick={() => setMoreOpen((o) => !o)}
              className="flex min-h-14 w-full flex-col items-center justify-center text-xs font-semibold text-tide-500"
            >
              <Menu aria-hidden className="size-6" /> More
            </button>
          </li>
        </ul>
        {moreOpen && (
          <div className="absolute inset-x-0 bottom-full border-t border-tide-200 bg-white p-3 shadow-lg">
            <ul className="grid grid-cols-2 gap-2">
              {items
                .filter((i) => !i.primary)
                .map((item) => (
                  <li key={item.to}>
                    <NavLink
                      to={item.to}
                      onClick={() => setMoreOpen(false)}
                      className="flex min-h-11 items-center gap-2 rounded-lg px-3 font-semibold text-tide-800 hover:bg-tide-50"
                    >
                      <item.icon aria-hidden className="size-5" /> {item.label}
                    </NavLink>
                  </li>
                ))}
              <li>
                <button
                  type="button"
                  onClick={doSignOut}
                  className="flex min-h-11 w-full items-center gap-2 rounded-lg px-3 font-semibold text-tide-800 hover:bg-tide-50"
                >
                  <LogOut aria-hidden className="size-5" /> Sign out
                </button>
              </li>
            </ul>
            <p className="mt-2 px-3 text-sm text-tide-600">
              Signed in as {me.name} ({ROLE_LABELS[me.role]})
            </p>
          </div>
        )}
      </nav>
    </div>
  )
}
