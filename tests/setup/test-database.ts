// The test database: TEST_DATABASE_URL when npm test made it, otherwise a fresh one in the
// project-local cluster (so `npx vitest` works on its own too).
import { join, resolve } from 'node:path';
import { clusterUrl, ensureDatabase, startCluster, type ClusterOptions } from '../../scripts/lib/postgres';

const root = resolve(import.meta.dirname, '../..');

export async function testDatabaseUrl(name = 'parlour_test'): Promise<string> {
  if (process.env.TEST_DATABASE_URL) return process.env.TEST_DATABASE_URL;
  const cluster: ClusterOptions = { dataDir: join(root, 'data', 'pg'), port: Number(process.env.PG_PORT ?? 5481), fsync: false };
  startCluster(cluster);
  await ensureDatabase(cluster, name, true);
  const url = clusterUrl(cluster, name);
  process.env.TEST_DATABASE_URL = url;
  return url;
}
