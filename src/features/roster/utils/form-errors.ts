import type { FieldError, FieldValues, Path, UseFormReturn } from 'react-hook-form'
import { ApiError } from '../../../lib/api-client'

/** zod's wording for an empty number select is written for developers; the server's own words are kept. */
export const personError = (error: FieldError | undefined) => (error ? (error.type === 'server' ? error.message : 'Choose a person') : undefined)
export const numberError = (message: string | undefined) => (message && /expected number/i.test(message) ? 'Enter a whole number' : message)

/** A 400's field errors go under their fields (first segment of the path), the rest to the form's summary. */
export function applyServerErrors<T extends FieldValues>(form: UseFormReturn<T>, error: unknown) {
  if (!(error instanceof ApiError) || error.code !== 'validation_failed') return
  const fields = Object.keys(form.getValues())
  let placed = false
  for (const [key, messages] of Object.entries(error.fieldErrors ?? {})) {
    const field = key.split('.')[0]
    if (fields.includes(field)) {
      form.setError(field as Path<T>, { type: 'server', message: messages[0] })
      placed = true
    }
  }
  if (!placed) form.setError('root.server', { message: error.message })
}
