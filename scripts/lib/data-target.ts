// Where backup and restore read and write: DATABASE_URL when set, otherwise the project-local
// cluster in DATA_DIR/pg (started for the job and stopped again if it was not running), and the
// file store the configuration names (DATA_DIR/files or the S3 bucket).
import { spawnSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import { clusterUrl, ensureDatabase, startCluster, stopCluster, type ClusterOptions } from './postgres';
import { storageFromConfig } from '../../server/services/storage/from-config';
import type { ListableStorage } from '../../server/services/storage/storage';

export const LOCAL_DATABASE = 'parlour';

export interface DataTarget {
  dataDir: string;
  databaseUrl: string;
  storage: ListableStorage;
  /** Stops the local cluster if this job started it. */
  release(): void;
}

export async function openDataTarget(env: NodeJS.ProcessEnv = process.env): Promise<DataTarget> {
  const dataDir = resolve(env.DATA_DIR ?? 'data');
  let databaseUrl = env.DATABASE_URL;
  let started: ClusterOptions | null = null;
  if (!databaseUrl) {
    const cluster: ClusterOptions = { dataDir: join(dataDir, 'pg'), port: Number(env.PG_PORT ?? 5481), fsync: true };
    if (startCluster(cluster)) started = cluster;
    await ensureDatabase(cluster, LOCAL_DATABASE);
    databaseUrl = clusterUrl(cluster, LOCAL_DATABASE);
  }
  const storage = storageFromConfig({
    STORAGE: env.STORAGE === 's3' ? 's3' : 'local',
    DATA_DIR: dataDir,
    S3_ENDPOINT: env.S3_ENDPOINT,
    S3_BUCKET: env.S3_BUCKET,
    S3_REGION: env.S3_REGION ?? 'us-east-1',
    S3_ACCESS_KEY_ID: env.S3_ACCESS_KEY_ID,
    S3_SECRET_ACCESS_KEY: env.S3_SECRET_ACCESS_KEY,
    S3_FORCE_PATH_STYLE: env.S3_FORCE_PATH_STYLE === 'true',
  });
  return {
    dataDir,
    databaseUrl,
    storage,
    release: () => {
      if (started) stopCluster(started);
    },
  };
}

/** Rows per table in the public schema, by table name, for the manifest and for checking a restore. */
export async function tableCounts(
  query: (text: string) => Promise<{ rows: Record<string, unknown>[] }>,
): Promise<Record<string, number>> {
  const tables = await query(`select tablename from pg_tables where schemaname = 'public' order by tablename`);
  const counts: Record<string, number> = {};
  for (const { tablename } of tables.rows as { tablename: string }[]) {
    const r = await query(`select count(*)::int as n from "${tablename.replace(/"/g, '""')}"`);
    counts[tablename] = Number(r.rows[0].n);
  }
  return counts;
}

/** Runs a tool (pg_dump, tar…) to the end; throws with its own words when it fails. */
export function run(cmd: string, args: string[]): void {
  const res = spawnSync(cmd, args, { encoding: 'utf8' });
  if (res.status !== 0) throw new Error(`${cmd} failed: ${res.stderr || res.stdout || res.error?.message}`);
}
