// npm run typecheck: `tsc -b` over the TypeScript projects that tsconfig.json references (shared,
// client, server, tests, scripts), each checked with its own settings against the declarations of
// the projects it uses (written to .tsbuild/, so an unchanged project is not checked again). The
// build announces each project before its errors, so each error is put down to its project. Prints
// one line per project and exits non-zero when any failed; scripts/test.ts runs it as its
// `typecheck` step and counts each project once.
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import ts from 'typescript';

const root = resolve(import.meta.dirname, '..');

/** What each referenced folder is called in reports. */
const PROJECT_NAMES: Record<string, string> = { src: 'client' };

export interface TypecheckResult {
  name: string;
  /** The project's tsconfig.json, from the repository root. */
  config: string;
  passed: boolean;
  errors: string[];
}

/** The projects tsconfig.json references, in its order. */
export function typecheckProjects(): { name: string; config: string }[] {
  const file = join(root, 'tsconfig.json');
  const solution = ts.parseConfigFileTextToJson(file, readFileSync(file, 'utf8')).config as { references: { path: string }[] };
  return solution.references.map(({ path }) => {
    const dir = relative(root, resolve(root, path));
    return { name: PROJECT_NAMES[dir] ?? dir, config: join(dir, 'tsconfig.json') };
  });
}

const BUILDING = /Building project '([^']+)'/;
const ERROR = /error TS\d+/;

export function typecheck(): TypecheckResult[] {
  const results: TypecheckResult[] = typecheckProjects().map((p) => ({ ...p, passed: true, errors: [] }));
  const res = spawnSync(
    process.execPath,
    [join(root, 'node_modules/typescript/bin/tsc'), '-b', '--verbose', '--pretty', 'false'],
    { cwd: root, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 },
  );
  // Errors the build prints before naming a project (a broken tsconfig) count against the build itself.
  const build: TypecheckResult = { name: 'build', config: 'tsconfig.json', passed: true, errors: [] };
  let current = build;
  for (const line of `${res.stdout ?? ''}\n${res.stderr ?? ''}`.split('\n')) {
    const building = BUILDING.exec(line);
    if (building) {
      const config = relative(root, building[1] ?? '');
      current = results.find((r) => r.config === config) ?? build;
    } else if (ERROR.test(line) || (current.errors.length > 0 && /^\s/.test(line))) {
      current.errors.push(line);
    }
  }
  if (res.status !== 0 && results.every((r) => r.errors.length === 0) && build.errors.length === 0)
    build.errors.push(`tsc -b exited with ${res.status ?? res.signal}: ${(res.stderr ?? '').trim().slice(0, 400)}`);
  for (const r of results) r.passed = !r.errors.some((l) => ERROR.test(l));
  if (build.errors.length === 0) return results;
  build.passed = false;
  return [...results, build];
}

export function printTypecheck(results: readonly TypecheckResult[]): void {
  for (const r of results) {
    const count = r.errors.filter((l) => ERROR.test(l)).length;
    console.log(`[typecheck] ${r.name} (${r.config}): ${r.passed ? 'passed' : `failed, ${count} error(s)`}`);
    if (!r.passed) console.log(r.errors.map((l) => `  ${l}`).join('\n'));
  }
  const failed = results.filter((r) => !r.passed).map((r) => r.name);
  if (failed.length > 0) console.log(`[typecheck] failed: ${failed.join(', ')}`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const results = typecheck();
  printTypecheck(results);
  process.exit(results.every((r) => r.passed) ? 0 : 1);
}
