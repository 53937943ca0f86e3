import { validateRule } from '#shared/schedule/describe-rule'
import { expandRule } from '#shared/schedule/expand-rule'
import { RoutineInputSchema } from '#shared/schemas/routine'

/** The shared input schema plus the checks the server makes against the facility: the rule must expand there. */
export function routineFormSchema(timeZone: string) {
  return RoutineInputSchema.superRefine((r, ctx) => {
    let ruleError = validateRule(r.rrule)
    if (!ruleError) {
      try {
        expandRule({ rrule: r.rrule, dtstart: r.dtstart, tzid: timeZone, limit: 1 })
      } catch (error) {
        ruleError = error instanceof Error ? error.message : String(error)
      }
    }
    if (ruleError) ctx.addIssue({ code: 'custom', path: ['rrule'], message: ruleError })
    if (r.assigneeRule.kind === 'person' && r.assigneeRule.personId <= 0) {
      ctx.addIssue({ code: 'custom', path: ['assigneeRule', 'personId'], message: 'Choose a person' })
    }
  })
}

/** zod's own wording for a cleared number input is written for developers. */
export const plainNumberError = (message: string | undefined) =>
  message && /expected number/i.test(message) ? 'Enter a whole number of minutes' : message
