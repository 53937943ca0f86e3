import { defineConfig } from 'vitest/config'

// `npm run test:reliability` (scripts/reliability.sh): load and fault tests against app processes
// started as children, on a MariaDB server of their own. One file at a time: they kill things.
export default defineConfig({
  test: {
    name: 'reliability',
    include: ['tests/reliability/**/*.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 180_000,
    hookTimeout: 120_000,
    teardownTimeout: 30_000,
    reporters: ['default'],
  },
})
