import { z } from 'zod'
import { text } from './text'

export const ROLES = ['manager', 'supervisor', 'technician', 'observer'] as const
export const RoleSchema = z.enum(ROLES)
export type Role = z.infer<typeof RoleSchema>

export const ROLE_LABELS: Record<Role, string> = {
  manager: 'Manager',
  supervisor: 'Supervisor',
  technician: 'Technician',
  observer: 'Observer',
}

const email = text().trim().toLowerCase().email('Enter a valid e-mail address').max(200)
// bcrypt reads at most 72 bytes of a password; longer ones would be silently truncated.
const password = text()
  .min(10, 'Use at least 10 characters')
  .refine((p) => new TextEncoder().encode(p).length <= 72, 'Use at most 72 bytes')

export const PersonSchema = z.object({
  id: z.number().int(),
  email: text(),
  name: text(),
  title: text().nullable(),
  phone: text().nullable(),
  role: RoleSchema,
  active: z.boolean(),
  onCallEligible: z.boolean(),
  createdAt: text(),
})
export type Person = z.infer<typeof PersonSchema>

export const SignInInputSchema = z.object({
  email,
  password: text().min(1, 'Enter your password').max(200),
})
export type SignInInput = z.infer<typeof SignInInputSchema>

export const CreatePersonInputSchema = z.object({
  email,
  name: text().trim().min(1, 'Required').max(120),
  title: text().trim().max(160).nullable().optional(),
  phone: text().trim().max(40).nullable().optional(),
  role: RoleSchema,
  onCallEligible: z.boolean().default(false),
  password,
})
export type CreatePersonInput = z.input<typeof CreatePersonInputSchema>

export const UpdatePersonInputSchema = z
  .object({
    name: text().trim().min(1, 'Required').max(120),
    title: text().trim().max(160).nullable(),
    phone: text().trim().max(40).nullable(),
    role: RoleSchema,
    active: z.boolean(),
    onCallEligible: z.boolean(),
  })
  .partial()
export type UpdatePersonInput = z.infer<typeof UpdatePersonInputSchema>

export const ResetPasswordInputSchema = z.object({ password })
export type ResetPasswordInput = z.infer<typeof ResetPasswordInputSchema>

/** My own settings: the address I sign in with (escalation mail goes there too) and my quiet hours. */
// My preferences (address, channels, quiet hours) are in ./preferences.ts.

export const PersonIdParamSchema = z.object({ id: z.coerce.number().int().positive() })

export const StaffMemberSchema = z.object({
  id: z.number().int(),
  name: text(),
  role: RoleSchema,
  onCallEligible: z.boolean(),
  phone: text().nullable(),
})
export type StaffMember = z.infer<typeof StaffMemberSchema>
