import type { z } from 'zod'

/**
 * Plain words for the number checks in the shared schemas, passed to zodResolver per parse.
 * Messages written on the schema itself ('Required', 'Use HH:MM, 24-hour') still win.
 */
export const formMessages: z.core.$ZodErrorMap = (issue) => {
  if (issue.code === 'invalid_type' && issue.expected === 'number') return 'Enter a number'
  if (issue.code === 'invalid_type' && issue.expected === 'int') return 'Enter a whole number'
  if (issue.origin !== 'number') return undefined
  if (issue.code === 'too_small') return issue.inclusive ? `Enter ${issue.minimum} or more` : `Enter a number above ${issue.minimum}`
  if (issue.code === 'too_big') return issue.inclusive ? `Enter ${issue.maximum} or less` : `Enter a number below ${issue.maximum}`
  return undefined
}
