// vitest globalSetup for unit, API and reference tests: a migrated test database.
import type { TestProject } from 'vitest/node';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { testDatabase } from './test-database';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const { url, drop } = await testDatabase();
  const db = createDb(url, 1);
  await migrateToLatest(db);
  await db.destroy();
  project.provide('databaseUrl', url);
  return drop;
}
