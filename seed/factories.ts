import { randomUUID } from 'node:crypto'
import type { CreatePersonInput, Role } from '#shared/schemas/person'

export const TEST_PASSWORD = 'correct-horse-tide-42'

/** A unique person input; tests and the seed both build people through here. */
export function buildPersonInput(overrides: Partial<CreatePersonInput> & { role?: Role } = {}): CreatePersonInput {
  const tag = randomUUID().slice(0, 8)
  return {
    email: `person-${tag}@roundtide.example`,
    name: `Person ${tag}`,
    title: null,
    phone: null,
    role: 'technician',
    onCallEligible: false,
    password: TEST_PASSWORD,
    ...overrides,
  }
}
