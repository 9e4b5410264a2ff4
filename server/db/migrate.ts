// Runs the migrations in migrations/index.ts to bring the database to the newest one.
import { Migrator, type MigrationProvider } from 'kysely';
import type { Db } from './database';
import { migrations } from '../../migrations';

const provider: MigrationProvider = { getMigrations: async () => migrations };

/** Brings the database to the newest migration; throws with the failing migration's name. */
export async function migrateToLatest(db: Db): Promise<void> {
  const migrator = new Migrator({ db, provider });
  const { error, results } = await migrator.migrateToLatest();
  const failed = results?.find((r) => r.status === 'Error');
  if (error) throw new Error(`Migration ${failed?.migrationName ?? ''} failed: ${String((error as Error).message ?? error)}`);
}
