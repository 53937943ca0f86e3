import { plannableRuleProblem } from '#shared/schedule/plannable-rule'
import { RoutineInputSchema } from '#shared/schemas/routine'

/** The shared input schema plus the checks the server makes against the facility: tasks can be planned from the rule there. */
export function routineFormSchema(timeZone: string) {
  return RoutineInputSchema.superRefine((r, ctx) => {
    const ruleError = plannableRuleProblem({ rrule: r.rrule, dtstart: r.dtstart, tzid: timeZone })
    if (ruleError) ctx.addIssue({ code: 'custom', path: ['rrule'], message: ruleError })
    if (r.assigneeRule.kind === 'person' && r.assigneeRule.personId <= 0) {
      ctx.addIssue({ code: 'custom', path: ['assigneeRule', 'personId'], message: 'Choose a person' })
    }
  })
}

/** zod's own wording for a cleared number input is written for developers. */
export const plainNumberError = (message: string | undefined) => (message && /expected number/i.test(message) ? 'Enter a whole number of minutes' : message)
