import { useForm } from 'react-hook-form'
import { toast } from 'sonner'
import type { StockSettings } from '#shared/schemas/stock'
import { Button } from '../../../components/ui/button'
import { Field } from '../../../components/ui/field'
import { TextAreaField } from '../../../components/ui/text-area-field'
import { ApiError } from '../../../lib/api-client'
import { useUpdateStockSettings } from '../api/use-update-stock-settings'
import { toSettingsForm, toSettingsInput, type SettingsFormValues } from '../utils/settings-form'

const number = { valueAsNumber: true, required: 'Required' } as const

/** The facility's causes of death, the 7-day loss threshold and the incident deadlines (managers). */
export function AnimalRecordSettingsForm({ settings }: { settings: StockSettings }) {
  const update = useUpdateStockSettings()
  const form = useForm<SettingsFormValues>({ values: toSettingsForm(settings) })
  const errors = form.formState.errors
  const submit = form.handleSubmit((values) =>
    update.mutate(toSettingsInput(values), {
      onSuccess: () => toast.success('Animal record settings saved.'),
      onError: (error) => {
        for (const [field, messages] of Object.entries(error instanceof ApiError ? (error.fieldErrors ?? {}) : {})) {
          form.setError((field.startsWith('mortalityCauses') ? 'causes' : field) as keyof SettingsFormValues, { message: messages[0] })
        }
      },
    }),
  )
  return (
    <form
      noValidate
      onSubmit={submit}
      aria-label="Animal record settings"
      className="flex flex-col gap-4 rounded-xl border border-tide-200 bg-white p-4 md:p-5"
    >
      <TextAreaField label="Causes of death (one per line)" rows={5} {...form.register('causes')} error={errors.causes?.message} />
      <p className="-mt-2 text-sm text-tide-700">The round offers these, and always “Unknown” and “Other” in words.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="7-day losses that raise a flag (% of the batch)"
          type="number"
          inputMode="decimal"
          step="any"
          {...form.register('mortalityWeekPct', number)}
          error={errors.mortalityWeekPct?.message}
        />
        <Field
          label="Tell the welfare officer within (hours)"
          type="number"
          inputMode="numeric"
          {...form.register('notifyWelfareOfficerHours', number)}
          error={errors.notifyWelfareOfficerHours?.message}
        />
        <Field
          label="Report to the ethics committee within (hours)"
          type="number"
          inputMode="numeric"
          {...form.register('notifyCommitteeHours', number)}
          error={errors.notifyCommitteeHours?.message}
        />
        <Field
          label="Full report within (hours)"
          type="number"
          inputMode="numeric"
          {...form.register('fullReportHours', number)}
          error={errors.fullReportHours?.message}
        />
      </div>
      <p className="text-sm text-tide-700">Common practice for institutional animal-ethics rules; your local code and committee decide.</p>
      <div>
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save animal record settings'}
        </Button>
      </div>
    </form>
  )
}
