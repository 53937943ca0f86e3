import type { Request, Response } from 'express'
import { describe, expect, test } from 'vitest'
import { AppError } from '#server/lib/errors'
import { requireRole } from '#server/lib/require-role'
import type { Role } from '#shared/schemas/person'

function run(guard: ReturnType<typeof requireRole>, role?: Role) {
  let passed: unknown = 'not called'
  const req = { user: role ? { id: 1, role } : undefined } as unknown as Request
  guard(req, {} as Response, (err?: unknown) => (passed = err))
  return passed
}

describe('requireRole', () => {
  test('when nobody is signed in, then it refuses with 401', () => {
    const err = run(requireRole('manager')) as AppError
    expect(err).toBeInstanceOf(AppError)
    expect(err.status).toBe(401)
  })

  test('when the role is listed, then it lets the request through', () => {
    expect(run(requireRole('manager', 'supervisor'), 'supervisor')).toBeUndefined()
  })

  test('when the role is not listed, then it refuses with 403 naming who may and who you are', () => {
    const err = run(requireRole('manager'), 'technician') as AppError
    expect(err.status).toBe(403)
    expect(err.message).toBe('Only managers can do this; you are signed in as a technician.')
  })

  test('when no role is named, then any signed-in person passes', () => {
    expect(run(requireRole(), 'observer')).toBeUndefined()
  })
})
