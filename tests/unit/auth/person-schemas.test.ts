import { describe, expect, test } from 'vitest'
import { CreatePersonInputSchema, SignInInputSchema, UpdatePersonInputSchema } from '#shared/schemas/person'

const valid = { email: 'Kai.Reef@Roundtide.Example ', name: ' Kai Reef ', role: 'technician', password: 'long-enough-pw' }

describe('person schemas', () => {
  test('when an e-mail has capitals and spaces, then it is trimmed and lower-cased', () => {
    expect(CreatePersonInputSchema.parse(valid).email).toBe('kai.reef@roundtide.example')
    expect(SignInInputSchema.parse({ email: valid.email, password: 'x' }).email).toBe('kai.reef@roundtide.example')
  })

  test('when the password is shorter than 10 characters, then it is refused with a reason', () => {
    const r = CreatePersonInputSchema.safeParse({ ...valid, password: 'short' })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0].message).toBe('Use at least 10 characters')
  })

  test('when the password is longer than bcrypt reads (72 bytes), then it is refused rather than silently cut', () => {
    const r = CreatePersonInputSchema.safeParse({ ...valid, password: 'ü'.repeat(40) })
    expect(r.success).toBe(false)
  })

  test('when the role is not one of ours, then it is refused', () => {
    expect(CreatePersonInputSchema.safeParse({ ...valid, role: 'admin' }).success).toBe(false)
  })

  test('when an update names only some fields, then the rest stay out of the result', () => {
    expect(UpdatePersonInputSchema.parse({ role: 'observer' })).toEqual({ role: 'observer' })
  })
})
