// npm test: a fresh test database in the project-local cluster, then typecheck, unit + API +
// reference tests, and browser tests. Ends with one plain line: "N passed, N failed".
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { spawnSync } from 'node:child_process';
import { clusterUrl, ensureDatabase, startCluster, stopCluster, type ClusterOptions } from './lib/postgres';
import { buildClientIfStale } from './lib/build-client';
import { lintChecks, printChecks } from './lint';
import { printTypecheck, typecheck } from './typecheck';

const root = resolve(import.meta.dirname, '..');
const out = join(root, '.test-output');
const only = process.argv.slice(2); // e.g. `npm test -- unit`, `-- api`, `-- ops`, `-- lint`, `-- typecheck` or `-- e2e`

interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}
const total: Tally = { passed: 0, failed: 0, skipped: 0 };
let lintSummary = '';
let typecheckSummary = '';

function step(name: string): boolean {
  return only.length === 0 || only.includes(name);
}

function runVitest(name: string, config: string, env: NodeJS.ProcessEnv, projects: string[] = []): void {
  const json = join(out, `${name}.json`);
  rmSync(json, { force: true });
  const res = spawnSync(
    process.execPath,
    [
      join(root, 'node_modules/vitest/vitest.mjs'),
      'run',
      '--config',
      config,
      ...projects.flatMap((p) => ['--project', p]),
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${json}`,
    ],
    { cwd: root, stdio: 'inherit', env: { ...env, NO_COLOR: '1' } },
  );
  if (!existsSync(json)) {
    console.error(`[test] ${name}: vitest wrote no results (exit ${res.status}).`);
    total.failed += 1;
    return;
  }
  const r = JSON.parse(readFileSync(json, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests?: number;
    numFailedTestSuites?: number;
  };
  total.passed += r.numPassedTests;
  total.failed += r.numFailedTests + (r.numFailedTests === 0 && res.status !== 0 ? Math.max(1, r.numFailedTestSuites ?? 1) : 0);
  total.skipped += r.numPendingTests + (r.numTodoTests ?? 0);
}

async function main(): Promise<number> {
  mkdirSync(out, { recursive: true });
  const cluster: ClusterOptions = {
    dataDir: join(root, 'data', 'pg'),
    port: Number(process.env.PG_PORT ?? 5481),
    fsync: false, // tests may trade durability for speed
  };
  let started = false;
  let databaseUrl = process.env.TEST_DATABASE_URL;
  if (!databaseUrl) {
    started = startCluster(cluster);
    await ensureDatabase(cluster, 'parlour_test', true);
    databaseUrl = clusterUrl(cluster, 'parlour_test');
  }
  const env = { ...process.env, TEST_DATABASE_URL: databaseUrl };
  try {
    if (step('lint')) {
      console.log('\n[test] lint');
      const checks = lintChecks();
      printChecks(checks);
      for (const c of checks) {
        if (c.fails && c.problems > 0) total.failed += 1;
        else total.passed += 1;
      }
      lintSummary = checks.map((c) => `${c.name} ${c.problems}`).join(', ');
    }
    if (step('typecheck')) {
      console.log('\n[test] typecheck');
      const results = typecheck();
      printTypecheck(results);
      for (const r of results) {
        if (r.passed) total.passed += 1;
        else total.failed += 1;
      }
      typecheckSummary = results.map((r) => `${r.name} ${r.passed ? 'passed' : 'failed'}`).join(', ');
    }
    const projects = ['unit', 'api', 'ops'].filter((p) => only.includes(p));
    if (only.length === 0) {
      console.log('\n[test] unit, reference, API and operations tests');
      runVitest('vitest', 'vitest.config.ts', env);
    } else if (projects.length > 0) {
      console.log(`\n[test] ${projects.join(', ')} tests`);
      runVitest(projects.join('-'), 'vitest.config.ts', env, projects);
    }
    if (step('e2e')) {
      console.log('\n[test] browser tests');
      buildClientIfStale(root);
      runVitest('e2e', 'vitest.e2e.config.ts', env);
    }
  } finally {
    if (started) stopCluster(cluster);
  }
  if (lintSummary) console.log(`\n[test] lint problems: ${lintSummary}`);
  if (typecheckSummary) console.log(`[test] typecheck: ${typecheckSummary}`);
  const skipped = total.skipped ? `, ${total.skipped} skipped` : '';
  console.log(`\n${total.passed} passed, ${total.failed} failed${skipped}`);
  return total.failed > 0 || total.passed === 0 ? 1 : 0;
}

main().then(
  (code) => process.exit(code),
  (err) => {
    console.error(`[test] could not run: ${err instanceof Error ? err.message : String(err)}`);
    console.log('\n0 passed, 1 failed');
    process.exit(1);
  },
);
