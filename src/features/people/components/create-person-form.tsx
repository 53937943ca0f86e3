import { zodResolver } from '@hookform/resolvers/zod'
import { useForm } from 'react-hook-form'
import { toast } from 'sonner'
import { CreatePersonInputSchema, ROLES, ROLE_LABELS, type CreatePersonInput } from '#shared/schemas/person'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import { useCreatePerson } from '../api/use-people-mutations'

export function CreatePersonForm({ onDone }: { onDone: () => void }) {
  const create = useCreatePerson()
  const form = useForm<CreatePersonInput>({
    resolver: zodResolver(CreatePersonInputSchema),
    defaultValues: { name: '', email: '', role: 'technician', password: '', onCallEligible: false },
  })
  const errors = form.formState.errors

  const submit = form.handleSubmit((input) =>
    create.mutate(input, {
      onSuccess: (person) => {
        toast.success(`${person.name} can now sign in.`)
        form.reset()
        onDone()
      },
      onError: (error) => {
        if (error instanceof ApiError && error.fieldErrors) {
          for (const [field, messages] of Object.entries(error.fieldErrors)) {
            form.setError(field as keyof CreatePersonInput, { message: messages[0] })
          }
        }
      },
    }),
  )

  return (
    <form noValidate onSubmit={submit} className="grid gap-4 rounded-xl border border-tide-200 bg-white p-4 sm:grid-cols-2">
      <Field label="Name" {...form.register('name')} error={errors.name?.message} />
      <Field label="E-mail" type="email" {...form.register('email')} error={errors.email?.message} />
      <div className="flex flex-col gap-1">
        <label htmlFor="new-person-role" className="text-sm font-semibold text-tide-800">
          Role
        </label>
        <select id="new-person-role" className="min-h-11 rounded-lg border border-tide-200 bg-white px-3" {...form.register('role')}>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </select>
      </div>
      <Field
        label="First password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters; they can change it later."
        {...form.register('password')}
        error={errors.password?.message}
      />
      <label className="flex min-h-11 items-center gap-2 text-tide-800">
        <input type="checkbox" className="size-5" {...form.register('onCallEligible')} /> Can hold on-call duty
      </label>
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Adding…' : 'Add person'}
        </Button>
        <Button type="button" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  )
}
