// The test database: TEST_DATABASE_URL when npm test made it, otherwise a fresh one of this run's
// own in the project-local cluster (so `npx vitest` works on its own, even beside another run).
import { join, resolve } from 'node:path';
import { clusterUrl, ensureDatabase, startCluster, type ClusterOptions } from '../../scripts/lib/postgres';
import pg from 'pg';

const root = resolve(import.meta.dirname, '../..');
const cluster: ClusterOptions = { dataDir: join(root, 'data', 'pg'), port: Number(process.env.PG_PORT ?? 5481), fsync: false };

/** The database URL for this run and a function that drops it again when this run made it. */
export async function testDatabase(prefix = 'parlour_test'): Promise<{ url: string; drop: () => Promise<void> }> {
  if (process.env.TEST_DATABASE_URL) return { url: process.env.TEST_DATABASE_URL, drop: async () => undefined };
  startCluster(cluster);
  const name = `${prefix}_${process.pid}`;
  await ensureDatabase(cluster, name, true);
  return {
    url: clusterUrl(cluster, name),
    drop: async () => {
      const client = new pg.Client({ connectionString: clusterUrl(cluster, 'postgres') });
      await client.connect();
      await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`).finally(() => client.end());
    },
  };
}
