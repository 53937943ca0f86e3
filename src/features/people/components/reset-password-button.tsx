import { useState } from 'react'
import { toast } from 'sonner'
import type { Person } from '#shared/schemas/person'
import { useResetPassword } from '../api/use-people-mutations'

export function ResetPasswordButton({ person }: { person: Person }) {
  const reset = useResetPassword()
  const [open, setOpen] = useState(false)
  const [password, setPassword] = useState('')
  if (!open) {
    return (
      <button type="button" className="min-h-9 rounded px-2 font-semibold text-tide-700 underline" onClick={() => setOpen(true)}>
        Reset password
      </button>
    )
  }
  return (
    <form
      className="flex gap-1"
      onSubmit={(e) => {
        e.preventDefault()
        reset.mutate(
          { id: person.id, password },
          {
            onSuccess: () => {
              toast.success(`New password set for ${person.name}; their other sessions have ended.`)
              setOpen(false)
              setPassword('')
            },
          },
        )
      }}
    >
      <input
        type="password"
        aria-label={`New password for ${person.name}`}
        minLength={10}
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        className="min-h-9 w-36 rounded border border-tide-200 px-2"
      />
      <button type="submit" className="rounded bg-tide-700 px-2 font-semibold text-white">
        Set
      </button>
    </form>
  )
}
