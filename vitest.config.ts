import { defineConfig } from 'vitest/config'

export default defineConfig({
  test: {
    // The API files share one database and the browser files each make their own, so the two
    // projects run side by side (one file at a time within each): on 2 cores the default of one
    // worker ran the whole suite in series.
    maxWorkers: 2,
    projects: [
      { test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' } },
      {
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts', 'tests/security/**/*.test.ts'],
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 60000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 60000,
        },
      },
    ],
  },
})
