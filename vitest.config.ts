import { fileURLToPath } from 'node:url'
import { defineConfig } from 'vitest/config'

const root = fileURLToPath(new URL('.', import.meta.url))
const alias = {
  '#shared': `${root}shared`,
  '~~': root.replace(/\/$/, ''),
}

// The API tests that do not reach into the SQLite file themselves, run again on PostgreSQL by
// .ci/run (KERNWISE_TEST_PG set), with the two-instance test.
const onPostgres = ['auth', 'roles-tokens', 'sketches', 'team', 'review', 'registration', 'access-matrix', 'analysis', 'analysis-checker', 'analysis-pool', 'sign-in-limits', 'requests', 'transport', 'fuzz']
const postgres = process.env.KERNWISE_TEST_PG
  ? [{
      resolve: { alias },
      test: {
        name: 'api-pg',
        environment: 'node',
        include: [...onPostgres.map(n => `tests/api/${n}.test.ts`), 'tests/api-pg/**/*.test.ts'],
        globalSetup: ['tests/api/global-setup.ts'],
        fileParallelism: false,
        testTimeout: 30_000,
        hookTimeout: 180_000,
      },
    }]
  : []

export default defineConfig({
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          environment: 'node',
          include: ['tests/unit/**/*.test.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          environment: 'node',
          include: ['tests/api/**/*.test.ts'],
          globalSetup: ['tests/api/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 180_000,
        },
      },
      ...postgres,
    ],
  },
})
