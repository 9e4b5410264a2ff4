// npm run bench:load — autocannon against the app on loopback, in a child process of its own,
// on a throwaway PostgreSQL cluster (fsync on, as in production). Two targets: the client's
// presentation data and the designer's project list. Exits 1 when the presentation target
// (>= 2,000 requests/s, p99 < 50 ms, no errors) is missed.
import autocannon, { type Result } from 'autocannon';
import request from 'supertest';
import { join } from 'node:path';
import { statSync } from 'node:fs';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { SESSION_COOKIE } from '../../server/services/auth/session';
import { freePort, throwawayCluster } from '../../scripts/lib/throwaway-cluster';
import { startServerProcess } from '../../scripts/lib/server-process';
import { presentedProject } from '../../tests/ops/lib/fixtures';

/** Seconds per target; bounded so a run cannot go on for ever. */
const MAX_SECONDS = 60;
const seconds = Math.min(MAX_SECONDS, Math.max(5, Number(process.env.LOAD_SECONDS ?? MAX_SECONDS)));
const listSeconds = Math.min(seconds, 20);
/** Open connections: a busy evening of clients behind one instance. */
const CONNECTIONS = 20;
const WARM_UP_SECONDS = 3;
const PROJECTS_IN_LIST = 24;
const TARGET = { requestsPerSecond: 2000, p99Ms: 50 };
const PASSWORD = 'a-long-benchmark-password';
const KEY = 'b7'.repeat(32);

interface Figures {
  name: string;
  seconds: number;
  requestsPerSecond: number;
  p50Ms: number;
  p99Ms: number;
  total: number;
  errors: number;
  non2xx: number;
}

function figures(name: string, s: number, r: Result): Figures {
  return {
    name,
    seconds: s,
    requestsPerSecond: Math.round(r.requests.average),
    p50Ms: r.latency.p50,
    p99Ms: r.latency.p99,
    total: r.requests.total,
    errors: r.errors + r.timeouts,
    non2xx: r.non2xx,
  };
}

const run = (url: string, s: number, headers: Record<string, string> = {}) =>
  autocannon({ url, connections: CONNECTIONS, duration: s, headers, pipelining: 1 });

async function main(): Promise<number> {
  const cluster = await throwawayCluster({ fsync: true, prefix: 'parlour-bench-' });
  let server: Awaited<ReturnType<typeof startServerProcess>> | null = null;
  try {
    const databaseUrl = await cluster.createDatabase('parlour_bench');
    const db = createDb(databaseUrl, 1);
    await migrateToLatest(db);
    await db.destroy();
    const port = await freePort();
    const logFile = join(cluster.dir, 'server.log');
    server = await startServerProcess({
      port,
      logFile,
      env: {
        DATABASE_URL: databaseUrl,
        DATA_DIR: join(cluster.dir, 'data'),
        PRESENTATION_KEY: KEY,
        NODE_ENV: 'production',
        LOG_LEVEL: 'info',
        CLIENT_DIST: '/nonexistent',
      },
    });

    const agent = request.agent(server.url);
    const signUp = await agent
      .post('/api/auth/sign-up')
      .send({ studioName: 'Bench Studio', name: 'Bea Bench', email: 'bench@bench.parlour', password: PASSWORD });
    if (signUp.status !== 201) throw new Error(`sign-up failed: ${signUp.status}`);
    const cookie = (signUp.headers['set-cookie'] as unknown as string[])
      .find((c) => c.startsWith(`${SESSION_COOKIE}=`))!
      .split(';')[0];
    const shown = await presentedProject(agent, 'Bench flat');
    for (let i = 1; i < PROJECTS_IN_LIST; i += 1) {
      await agent
        .post('/api/projects')
        .send({ name: `Project ${i}`, newClient: { name: `Client ${i}`, email: `client${i}@example.com` } });
    }

    const presentationUrl = `${server.url}/api/p/${shown.token}`;
    const listUrl = `${server.url}/api/projects`;
    await run(presentationUrl, WARM_UP_SECONDS);
    const presentation = figures('client presentation data (GET /api/p/:token)', seconds, await run(presentationUrl, seconds));
    await run(listUrl, WARM_UP_SECONDS, { cookie });
    const list = figures(
      `designer's project list (GET /api/projects, ${PROJECTS_IN_LIST} projects)`,
      listSeconds,
      await run(listUrl, listSeconds, { cookie }),
    );

    console.log(`# load: ${CONNECTIONS} connections, loopback, server in its own process, PostgreSQL with fsync on`);
    for (const f of [presentation, list]) {
      console.log(
        `${f.name}: ${f.requestsPerSecond} req/s, p50 ${f.p50Ms} ms, p99 ${f.p99Ms} ms, ${f.total} requests in ${f.seconds} s, ${f.errors} errors, ${f.non2xx} non-2xx`,
      );
    }
    console.log(`server log: ${Math.round(statSync(logFile).size / 1024)} KB of JSON lines`);
    const met =
      presentation.requestsPerSecond >= TARGET.requestsPerSecond &&
      presentation.p99Ms < TARGET.p99Ms &&
      presentation.errors === 0 &&
      presentation.non2xx === 0 &&
      list.errors === 0 &&
      list.non2xx === 0;
    console.log(
      met
        ? 'target met'
        : `target missed: >= ${TARGET.requestsPerSecond} req/s, p99 < ${TARGET.p99Ms} ms and no errors for presentation data`,
    );
    return met ? 0 : 1;
  } finally {
    await server?.stop();
    cluster.destroy();
  }
}

main().then(
  (code) => process.exit(code),
  (err) => {
    console.error(`bench:load could not run: ${err instanceof Error ? err.stack : String(err)}`);
    process.exit(1);
  },
);
