import { defineConfig } from 'vitest/config';

// Three projects: pure unit and reference tests (no database), API tests (supertest against the
// real PostgreSQL) and the operations tests (crash, database outage, backups, two instances).
// `npm test -- unit`, `-- api` or `-- ops` runs one of them; the browser tests have their own config.
export default defineConfig({
  test: {
    environment: 'node',
    testTimeout: 20000,
    hookTimeout: 60000,
    pool: 'forks',
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['shared/**/*.test.ts', 'server/**/*.test.ts', 'src/**/*.test.ts', 'tests/reference/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: { name: 'api', include: ['tests/api/**/*.test.ts'], globalSetup: ['tests/setup/database.ts'] },
      },
      {
        extends: true,
        test: { name: 'ops', include: ['tests/ops/**/*.test.ts'], globalSetup: ['tests/setup/database.ts'] },
      },
    ],
  },
});
