// A PostgreSQL cluster of its own in a temp folder, on its own port, for benchmarks and fault
// tests that must start, stop or load a database without touching the shared one in data/pg.
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { clusterUrl, ensureDatabase, startCluster, stopCluster, type ClusterOptions } from './postgres';

/** A free TCP port on loopback, as the OS hands one out. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => resolve(port));
    });
  });
}

export interface ThrowawayCluster {
  /** The temp folder holding the cluster; free for other scratch files too. */
  dir: string;
  options: ClusterOptions;
  url(database: string): string;
  createDatabase(database: string): Promise<string>;
  start(): void;
  stop(): void;
  /** Stops the cluster and deletes the folder. */
  destroy(): void;
}

export async function throwawayCluster(opts: { fsync: boolean; prefix?: string }): Promise<ThrowawayCluster> {
  const dir = mkdtempSync(join(tmpdir(), opts.prefix ?? 'parlour-pg-'));
  // As root the cluster runs as the postgres user, which must be able to enter the folder.
  chmodSync(dir, 0o755);
  const options: ClusterOptions = { dataDir: join(dir, 'pg'), port: await freePort(), fsync: opts.fsync };
  startCluster(options);
  return {
    dir,
    options,
    url: (database) => clusterUrl(options, database),
    async createDatabase(database) {
      await ensureDatabase(options, database, true);
      return clusterUrl(options, database);
    },
    start: () => void startCluster(options),
    stop: () => stopCluster(options),
    destroy() {
      try {
        stopCluster(options);
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}
