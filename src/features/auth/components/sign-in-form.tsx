import { zodResolver } from '@hookform/resolvers/zod'
import { useForm } from 'react-hook-form'
import { SignInInputSchema, type Person, type SignInInput } from '#shared/schemas/person'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import { useSignIn } from '../api/use-sign-in'

export function SignInForm({ onSignedIn }: { onSignedIn: (person: Person) => void }) {
  const signIn = useSignIn()
  const form = useForm<SignInInput>({ resolver: zodResolver(SignInInputSchema), defaultValues: { email: '', password: '' } })
  const failure = signIn.error instanceof ApiError ? signIn.error.message : signIn.error ? 'Could not sign in.' : null

  return (
    <form noValidate className="flex flex-col gap-4" onSubmit={form.handleSubmit((input) => signIn.mutate(input, { onSuccess: onSignedIn }))}>
      <Field label="E-mail" type="email" autoComplete="username" inputMode="email" {...form.register('email')} error={form.formState.errors.email?.message} />
      <Field label="Password" type="password" autoComplete="current-password" {...form.register('password')} error={form.formState.errors.password?.message} />
      {failure && (
        <p role="alert" className="rounded-lg bg-alarm-50 p-3 text-sm font-semibold text-alarm-700">
          {failure}
        </p>
      )}
      <Button type="submit" disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  )
}
