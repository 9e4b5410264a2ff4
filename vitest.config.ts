import { defineConfig } from 'vitest/config';

// Unit tests (next to the code), API tests (real PostgreSQL), reference checks, and the operations
// tests (crash, database outage, backups, two instances) under tests/ops.
export default defineConfig({
  test: {
    include: ['shared/**/*.test.ts', 'server/**/*.test.ts', 'src/**/*.test.ts', 'tests/api/**/*.test.ts', 'tests/reference/**/*.test.ts', 'tests/ops/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/setup/database.ts'],
    testTimeout: 20000,
    hookTimeout: 60000,
    pool: 'forks',
  },
});
