// npm run bench:load — autocannon against the app on loopback, in a child process of its own,
// on a throwaway PostgreSQL cluster (fsync on, as in production), measured against a bare Express
// server (scripts/bench/bare-server.ts, a process of its own too) that answers the client's link
// with the very bytes the app answers. The two run alternately, round after round, so both see the
// same machine; the figure is the ratio app / bare. Exits 1 when it is below 0.8 or any request
// failed (LOAD_REPORT_ONLY=1 only reports). Then the designer's project list, as a figure only.
import autocannon, { type Result } from 'autocannon';
import request from 'supertest';
import { join } from 'node:path';
import { loadavg } from 'node:os';
import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { createDb } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { SESSION_COOKIE } from '../../server/services/auth/session';
import { freePort, throwawayCluster } from '../../scripts/lib/throwaway-cluster';
import { startServerProcess, type ServerProcess } from '../../scripts/lib/server-process';
import { presentedProject } from '../../tests/ops/lib/fixtures';

/** Seconds per run; bounded so a run cannot go on for ever. */
const MAX_SECONDS = 60;
const seconds = Math.min(MAX_SECONDS, Math.max(5, Number(process.env.LOAD_SECONDS ?? 20)));
/** Rounds of app then bare server; at least 3, so each side has a range. */
const ROUNDS = Math.min(10, Math.max(3, Number(process.env.LOAD_ROUNDS ?? 3)));
const REPORT_ONLY = process.env.LOAD_REPORT_ONLY === '1';
const listSeconds = Math.min(seconds, 20);
/** Open connections: a busy evening of clients behind one instance. */
const CONNECTIONS = 20;
const WARM_UP_SECONDS = 3;
const PROJECTS_IN_LIST = 24;
/** The app's share of what a bare Express server answers on the same machine. */
const TARGET_RATIO = 0.8;
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
  /** The one-minute load average as the run ended. */
  load: number;
  /** Processor time the server process spent per answered request (user + system). */
  cpuUsPerRequest: number;
}

/** Processor time of a process so far, in microseconds (Linux: /proc; 0 elsewhere). */
function cpuUs(pid: number | undefined): number {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
    // utime and stime, fields 14 and 15 of stat(5), in clock ticks of 1/100 s.
    return (Number(fields[11]) + Number(fields[12])) * 10_000;
  } catch {
    return 0;
  }
}

function figures(name: string, s: number, r: Result, cpu = 0): Figures {
  return {
    name,
    seconds: s,
    requestsPerSecond: Math.round(r.requests.average),
    p50Ms: r.latency.p50,
    p99Ms: r.latency.p99,
    total: r.requests.total,
    errors: r.errors + r.timeouts,
    non2xx: r.non2xx,
    load: loadavg()[0],
    cpuUsPerRequest: r.requests.total ? Math.round(cpu / r.requests.total) : 0,
  };
}

const run = (url: string, s: number, headers: Record<string, string> = {}) =>
  autocannon({ url, connections: CONNECTIONS, duration: s, headers, pipelining: 1 });

/** One run against `server`, with the processor time its process spent meanwhile. */
async function measured(name: string, server: ServerProcess, url: string, s: number): Promise<Figures> {
  const before = cpuUs(server.child.pid);
  const r = await run(url, s);
  return figures(name, s, r, cpuUs(server.child.pid) - before);
}

const median = (xs: number[]) => {
  const sorted = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
};
const range = (xs: number[], digits = 0) => `${Math.min(...xs).toFixed(digits)}–${Math.max(...xs).toFixed(digits)}`;

const line = (f: Figures) =>
  `${f.name}: ${f.requestsPerSecond} req/s, p50 ${f.p50Ms} ms, p99 ${f.p99Ms} ms, ${f.total} requests in ${f.seconds} s, ${f.errors} errors, ${f.non2xx} non-2xx, load ${f.load.toFixed(2)}${f.cpuUsPerRequest ? `, ${f.cpuUsPerRequest} µs processor time per request` : ''}`;

async function main(): Promise<number> {
  const cluster = await throwawayCluster({ fsync: true, prefix: 'parlour-bench-' });
  let server: ServerProcess | null = null;
  let bare: ServerProcess | null = null;
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
      // LOAD_CPU_PROF=dir: the app writes a processor profile there when it stops (node --cpu-prof).
      nodeArgs: process.env.LOAD_CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${process.env.LOAD_CPU_PROF}`] : [],
      env: {
        DATABASE_URL: databaseUrl,
        DATA_DIR: join(cluster.dir, 'data'),
        PRESENTATION_KEY: KEY,
        NODE_ENV: 'production',
        LOG_LEVEL: process.env.LOAD_LOG_LEVEL ?? 'info',
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

    // The bare server answers with the very bytes and content type the app answered.
    const path = `/api/p/${shown.token}`;
    const answer = await fetch(`${server.url}${path}`);
    if (answer.status !== 200) throw new Error(`the link answered ${answer.status}`);
    const bytes = Buffer.from(await answer.arrayBuffer());
    const contentType = answer.headers.get('content-type') ?? 'application/json';
    const bodyFile = join(cluster.dir, 'answer.json');
    writeFileSync(bodyFile, bytes);
    bare = await startServerProcess({
      port: await freePort(),
      logFile: join(cluster.dir, 'bare.log'),
      env: { NODE_ENV: 'production' },
      entry: 'scripts/bench/bare-server.ts',
      args: [bodyFile, contentType],
    });
    const bareCheck = await fetch(`${bare.url}${path}`);
    const bareBytes = Buffer.from(await bareCheck.arrayBuffer());
    if (!bareBytes.equals(bytes) || bareCheck.headers.get('content-type') !== contentType)
      throw new Error('the bare server does not answer the same bytes');

    const targets = { app: `${server.url}${path}`, bare: `${bare.url}${path}` };
    await run(targets.app, WARM_UP_SECONDS);
    await run(targets.bare, WARM_UP_SECONDS);
    const rounds: { app: Figures; bare: Figures }[] = [];
    for (let i = 1; i <= ROUNDS; i += 1) {
      const app = await measured(`round ${i} app  `, server, targets.app, seconds);
      console.log(line(app));
      const b = await measured(`round ${i} bare `, bare, targets.bare, seconds);
      console.log(line(b));
      rounds.push({ app, bare: b });
    }

    await run(`${server.url}/api/projects`, WARM_UP_SECONDS, { cookie });
    const list = figures(
      `designer's project list (GET /api/projects, ${PROJECTS_IN_LIST} projects)`,
      listSeconds,
      await run(`${server.url}/api/projects`, listSeconds, { cookie }),
    );

    const apps = rounds.map((r) => r.app);
    const bares = rounds.map((r) => r.bare);
    const ratio = median(apps.map((f) => f.requestsPerSecond)) / median(bares.map((f) => f.requestsPerSecond));
    const perRound = rounds.map((r) => r.app.requestsPerSecond / r.bare.requestsPerSecond);
    const loads = [...apps, ...bares].map((f) => f.load);
    console.log(
      `# load: ${CONNECTIONS} connections, loopback, ${ROUNDS} rounds of ${seconds} s each side, app and bare server each in its own process, PostgreSQL with fsync on; ${bytes.length} bytes per answer (${contentType})`,
    );
    console.log(
      `client presentation data (GET /api/p/:token), app: ${range(apps.map((f) => f.requestsPerSecond))} req/s, p99 ${range(apps.map((f) => f.p99Ms))} ms`,
    );
    console.log(
      `bare Express server, same bytes: ${range(bares.map((f) => f.requestsPerSecond))} req/s, p99 ${range(bares.map((f) => f.p99Ms))} ms`,
    );
    console.log(
      `ratio app / bare: ${ratio.toFixed(2)} (medians; per round ${range(perRound, 2)}), load average ${range(loads, 1)}`,
    );
    const cpu = (fs: Figures[]) => median(fs.map((f) => f.cpuUsPerRequest));
    if (cpu(bares) > 0)
      console.log(
        `processor time per request (medians): app ${cpu(apps)} µs, bare ${cpu(bares)} µs (${(cpu(bares) / cpu(apps)).toFixed(2)} bare / app; less swayed by the machine's other work than req/s)`,
      );
    console.log(line(list));
    console.log(`server log: ${Math.round(statSync(logFile).size / 1024)} KB of JSON lines`);
    const failed = [...apps, ...bares, list].some((f) => f.errors > 0 || f.non2xx > 0);
    const met = ratio >= TARGET_RATIO && !failed;
    console.log(
      met
        ? `target met: >= ${TARGET_RATIO} of the bare server, no errors`
        : `target missed: >= ${TARGET_RATIO} of the bare server and no errors${REPORT_ONLY ? ' (LOAD_REPORT_ONLY=1: reported only)' : ''}`,
    );
    return met || REPORT_ONLY ? 0 : 1;
  } finally {
    await server?.stop();
    await bare?.stop();
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
