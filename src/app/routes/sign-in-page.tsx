import { useNavigate, useSearchParams } from 'react-router-dom'
import { SignInForm } from '../../features/auth/components/sign-in-form'
import { homeFor } from '../navigation'

export function Component() {
  const navigate = useNavigate()
  const [params] = useSearchParams()
  const redirectTo = params.get('redirectTo')
  const safeRedirect = redirectTo?.startsWith('/') && !redirectTo.startsWith('//') ? redirectTo : null

  return (
    <main className="flex min-h-dvh items-center justify-center bg-tide-900 p-4">
      <div className="w-full max-w-sm rounded-2xl bg-white p-6 shadow-xl">
        <div className="mb-6 flex items-center gap-3">
          <img src="/icon.svg" alt="" className="size-10" />
          <div>
            <h1 className="text-2xl font-bold text-tide-900">Roundtide</h1>
            <p className="text-sm text-tide-600">Sign in to your facility</p>
          </div>
        </div>
        {safeRedirect && (
          <p role="status" className="mb-4 rounded-lg bg-tide-50 px-3 py-2 text-sm text-tide-800">
            Sign in to go on to the page you were opening.
          </p>
        )}
        <SignInForm onSignedIn={(person) => navigate(safeRedirect ?? homeFor(person.role), { replace: true })} />
      </div>
    </main>
  )
}
