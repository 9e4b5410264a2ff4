// Project-local PostgreSQL cluster: created in a git-ignored folder, listening on 127.0.0.1 only.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, writeFileSync, chownSync } from 'node:fs';
import { join } from 'node:path';
import { userInfo } from 'node:os';
import pg from 'pg';

export interface ClusterOptions {
  dataDir: string; // absolute path of the cluster folder (data/pg)
  port: number;
  fsync: boolean;
}

const PG_USER = 'app';

/** The newest installed PostgreSQL server's bin folder (initdb, pg_ctl, pg_dump, pg_restore). */
export function binDir(): string {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) throw new Error('PostgreSQL server binaries are missing (Debian package "postgresql").');
  const versions = readdirSync(root)
    .filter((v) => existsSync(join(root, v, 'bin', 'initdb')))
    .sort((a, b) => Number(a) - Number(b));
  if (versions.length === 0) throw new Error('No PostgreSQL version with initdb found under /usr/lib/postgresql.');
  return join(root, versions[versions.length - 1], 'bin');
}

const isRoot = () => userInfo().uid === 0;

// initdb and pg_ctl refuse to run as root: run them as the postgres OS user on folders it owns.
function run(cmd: string, args: string[], quiet = true): void {
  const full = join(binDir(), cmd);
  const [file, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', full, ...args]] : [full, args];
  const res = spawnSync(file, argv, { stdio: quiet ? 'pipe' : 'inherit', encoding: 'utf8' });
  if (res.status !== 0) {
    throw new Error(`${cmd} failed (${res.status}): ${res.stderr || res.stdout}`);
  }
}

function ownForPostgres(dir: string): void {
  mkdirSync(dir, { recursive: true });
  if (isRoot()) execFileSync('chown', ['-R', 'postgres:postgres', dir]);
}

function paths(o: ClusterOptions) {
  const base = join(o.dataDir, '..');
  return { cluster: o.dataDir, socket: join(base, 'pg-socket'), log: join(base, 'postgres.log') };
}

export function clusterRunning(o: ClusterOptions): boolean {
  if (!existsSync(join(o.dataDir, 'PG_VERSION'))) return false;
  const full = join(binDir(), 'pg_ctl');
  const [file, argv] = isRoot()
    ? ['runuser', ['-u', 'postgres', '--', full, 'status', '-D', o.dataDir]]
    : [full, ['status', '-D', o.dataDir]];
  return spawnSync(file, argv, { stdio: 'pipe' }).status === 0;
}

/** Creates the cluster if missing and starts it unless it is running. Returns true if this call started it. */
export function startCluster(o: ClusterOptions): boolean {
  const p = paths(o);
  const base = join(o.dataDir, '..');
  mkdirSync(base, { recursive: true });
  if (!existsSync(join(o.dataDir, 'PG_VERSION'))) {
    ownForPostgres(o.dataDir);
    run('initdb', ['-D', o.dataDir, '-U', PG_USER, '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  }
  if (clusterRunning(o)) return false;
  ownForPostgres(p.socket);
  if (isRoot()) {
    writeFileSync(p.log, '');
    chownSync(p.log, uidOf('postgres'), gidOf('postgres'));
  }
  const opts =
    `-c listen_addresses=127.0.0.1 -p ${o.port} -k ${p.socket} -c fsync=${o.fsync ? 'on' : 'off'}` +
    (o.fsync ? '' : ' -c synchronous_commit=off -c full_page_writes=off');
  run('pg_ctl', ['-D', o.dataDir, '-l', p.log, '-w', '-t', '60', '-o', opts, 'start']);
  return true;
}

export function stopCluster(o: ClusterOptions): void {
  if (!clusterRunning(o)) return;
  run('pg_ctl', ['-D', o.dataDir, '-m', 'fast', '-w', 'stop']);
}

function uidOf(user: string): number {
  return Number(execFileSync('id', ['-u', user], { encoding: 'utf8' }).trim());
}
function gidOf(user: string): number {
  return Number(execFileSync('id', ['-g', user], { encoding: 'utf8' }).trim());
}

export function clusterUrl(o: ClusterOptions, database: string): string {
  return `postgres://${PG_USER}@127.0.0.1:${o.port}/${database}`;
}

/** Creates `database` if it does not exist; with `fresh`, drops it first. */
export async function ensureDatabase(o: ClusterOptions, database: string, fresh = false): Promise<void> {
  const client = new pg.Client({ connectionString: clusterUrl(o, 'postgres') });
  await client.connect();
  try {
    if (fresh) await client.query(`DROP DATABASE IF EXISTS "${database}" WITH (FORCE)`);
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${database}"`);
  } finally {
    await client.end();
  }
}
