import type { FieldValues, Path, UseFormReturn } from 'react-hook-form'
import { ApiError } from '../../../lib/api-client'

/**
 * Puts a failed save back on the form: 400 field errors under their fields, a 409 (taken code)
 * under the code field, anything else in the form's summary line.
 */
export function applyServerErrors<T extends FieldValues>(form: UseFormReturn<T>, error: unknown) {
  const fields = Object.keys(form.getValues())
  const fieldOrRoot = (key: string) => (fields.includes(key) ? (key as Path<T>) : 'root.server')
  if (!(error instanceof ApiError)) {
    form.setError('root.server', { message: 'Could not save. Please try again.' })
    return
  }
  if (error.status === 409) {
    form.setError(fieldOrRoot('code'), { message: error.message })
    return
  }
  if (!error.fieldErrors) {
    form.setError('root.server', { message: error.message })
    return
  }
  for (const [key, messages] of Object.entries(error.fieldErrors)) {
    form.setError(fieldOrRoot(key.split('.')[0]), { message: messages[0] })
  }
}
