import { zodResolver } from '@hookform/resolvers/zod'
import { MoonStar, Save } from 'lucide-react'
import { Controller, useForm } from 'react-hook-form'
import { CHANNELS } from '#shared/schemas/ladder'
import { toast } from 'sonner'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { ApiError } from '../../../lib/api-client'
import type { Preferences } from '#shared/schemas/preferences'
import { useUpdatePreferences } from '../api/use-update-preferences'
import { ChannelPicker } from './channel-picker'
import { preferencesFormSchema, toFormValues, toPreferencesInput, type PreferencesFormValues } from '../utils/preferences-form'

/** My addresses, the channels I accept and the hours in which routine messages wait. */
export function PreferencesForm({ preferences, timeZone }: { preferences: Preferences; timeZone: string }) {
  const update = useUpdatePreferences()
  const form = useForm<PreferencesFormValues>({ resolver: zodResolver(preferencesFormSchema(preferences.email)), defaultValues: toFormValues(preferences) })
  const errors = form.formState.errors
  const changingEmail = form.watch('email').trim().toLowerCase() !== preferences.email

  const submit = form.handleSubmit((values) =>
    update.mutate(toPreferencesInput(values, preferences.email), {
      onSuccess: (saved) => {
        toast.success('Preferences saved.')
        form.reset(toFormValues(saved))
      },
      onError: (error) => {
        for (const [field, messages] of Object.entries(error instanceof ApiError ? (error.fieldErrors ?? {}) : {})) {
          if (field in values) form.setError(field as keyof PreferencesFormValues, { message: messages[0] })
        }
      },
    }),
  )

  return (
    <form noValidate onSubmit={submit} aria-label="My preferences" className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <Field
        label="E-mail for escalations"
        type="email"
        autoComplete="email"
        hint="This is also the address you sign in with."
        {...form.register('email')}
        error={errors.email?.message}
      />
      {changingEmail && (
        <Field
          label="Current password"
          type="password"
          autoComplete="current-password"
          hint="Needed to change the address you sign in with."
          {...form.register('currentPassword')}
          error={errors.currentPassword?.message}
        />
      )}
      <Field
        label="Mobile number for texts"
        type="tel"
        autoComplete="tel"
        placeholder="+447700900123"
        hint="International form, starting with + and the country code."
        {...form.register('phone')}
        error={errors.phone?.message}
      />
      <Controller
        control={form.control}
        name="channels"
        render={({ field }) => (
          <ChannelPicker
            label="Reach me by"
            value={field.value}
            onChange={field.onChange}
            disabled={CHANNELS.filter((c) => c !== 'email' && !preferences.available[c])}
            error={errors.channels?.message}
          />
        )}
      />
      <p className="-mt-2 text-sm text-tide-700">
        A ladder step uses the channels it names that you accept. While you are on call, every channel you accept is used, quiet hours or not.
      </p>
      <fieldset className="flex flex-col gap-2">
        <legend className="flex items-center gap-2 font-semibold text-tide-900">
          <MoonStar aria-hidden className="size-5 text-tide-600" /> Quiet hours
        </legend>
        <p className="text-sm text-tide-700">
          Messages about routine work wait until your quiet hours end. Messages about a welfare-critical task or a critical reading never wait, nor do any while
          you are on call. Times are facility time ({timeZone}); leave both empty for no quiet hours.
        </p>
        <div className="grid grid-cols-2 gap-3 sm:max-w-sm">
          <Field label="From" type="time" {...form.register('quietStart')} error={errors.quietStart?.message} />
          <Field label="Until" type="time" {...form.register('quietEnd')} error={errors.quietEnd?.message} />
        </div>
      </fieldset>
      <Button type="submit" disabled={update.isPending} className="self-start">
        <Save aria-hidden className="size-5" /> {update.isPending ? 'Saving…' : 'Save preferences'}
      </Button>
    </form>
  )
}
