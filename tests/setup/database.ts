// vitest globalSetup for the API and operations projects: one migrated test database for the run.
// Both projects name this file; the first to start makes the database and the last to finish drops
// it (a process-wide promise, since each project loads its global set-up on its own).
import type { TestProject } from 'vitest/node';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { testDatabase } from './test-database';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

interface Shared {
  ready: Promise<{ url: string; drop: () => Promise<void> }>;
  users: number;
}
const holder = globalThis as typeof globalThis & { __parlourTestDatabase?: Shared };

async function migrated(): Promise<{ url: string; drop: () => Promise<void> }> {
  const database = await testDatabase();
  const db = createDb(database.url, 1);
  await migrateToLatest(db);
  await db.destroy();
  return database;
}

export default async function setup(project: TestProject) {
  const shared = (holder.__parlourTestDatabase ??= { ready: migrated(), users: 0 });
  shared.users += 1;
  const { url, drop } = await shared.ready;
  project.provide('databaseUrl', url);
  return async () => {
    shared.users -= 1;
    if (shared.users === 0) {
      holder.__parlourTestDatabase = undefined;
      await drop();
    }
  };
}
