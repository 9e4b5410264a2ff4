// npm run lint: ESLint (rules and import boundaries inside files), dependency-cruiser (boundaries
// between folders and no import circles), Prettier (the tree stays formatted), the Layout of
// DEVELOPERS.md (it names every folder), jscpd (code written twice) and headers (every source file
// opens with a comment saying what it is for). Prints one line per check and exits non-zero when a
// failing check found anything. scripts/test.ts runs the same checks as its `lint` step.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';

const root = resolve(import.meta.dirname, '..');
const out = join(root, '.test-output');
const bin = (name: string) => join(root, 'node_modules', '.bin', name);

export interface LintCheck {
  name: string;
  problems: number;
  fails: boolean;
  detail: string;
}

function run(cmd: string, args: string[]): { status: number | null; stdout: string; stderr: string } {
  const res = spawnSync(cmd, args, { cwd: root, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  return { status: res.status, stdout: res.stdout ?? '', stderr: res.stderr ?? '' };
}

function eslint(): LintCheck {
  const res = run(bin('eslint'), ['.', '--format', 'json', '--max-warnings', '0']);
  let results: { filePath: string; messages: { line: number; ruleId: string | null; message: string }[] }[];
  try {
    results = JSON.parse(res.stdout);
  } catch {
    return { name: 'eslint', problems: 1, fails: true, detail: `eslint did not run: ${res.stderr.trim().slice(0, 400)}` };
  }
  const lines = results.flatMap((f) =>
    f.messages.map((m) => `${f.filePath.slice(root.length + 1)}:${m.line} ${m.message} (${m.ruleId ?? 'parse'})`),
  );
  return { name: 'eslint', problems: lines.length, fails: true, detail: lines.join('\n') };
}

function imports(): LintCheck {
  const res = run(bin('depcruise'), [
    'src',
    'server',
    'shared',
    'migrations',
    'tests',
    'scripts',
    '--config',
    '.dependency-cruiser.cjs',
    '--output-type',
    'json',
  ]);
  let summary: { violations: { from: string; to: string; rule: { name: string } }[] };
  try {
    summary = JSON.parse(res.stdout).summary;
  } catch {
    return {
      name: 'imports',
      problems: 1,
      fails: true,
      detail: `dependency-cruiser did not run: ${res.stderr.trim().slice(0, 400)}`,
    };
  }
  const lines = summary.violations.map((v) => `${v.rule.name}: ${v.from} → ${v.to}`);
  return { name: 'imports', problems: lines.length, fails: true, detail: lines.join('\n') };
}

function duplicates(): LintCheck {
  const dir = join(out, 'jscpd');
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(out, { recursive: true });
  run(bin('jscpd'), ['--config', '.jscpd.json']);
  const file = join(dir, 'jscpd-report.json');
  if (!existsSync(file)) return { name: 'duplicates', problems: 1, fails: true, detail: 'jscpd wrote no report' };
  const report = JSON.parse(readFileSync(file, 'utf8')) as {
    duplicates: { lines: number; firstFile: { name: string; start: number }; secondFile: { name: string; start: number } }[];
  };
  const lines = report.duplicates.map(
    (d) => `${d.lines} lines: ${d.firstFile.name}:${d.firstFile.start} = ${d.secondFile.name}:${d.secondFile.start}`,
  );
  // The tree has no repetition left, so any new one fails.
  return { name: 'duplicates', problems: lines.length, fails: true, detail: lines.join('\n') };
}

function formatting(): LintCheck {
  // --list-different prints each file Prettier would change; `npm run format` fixes them.
  const res = run(bin('prettier'), ['--list-different', '.']);
  if (res.status !== 0 && res.status !== 1) {
    return { name: 'format', problems: 1, fails: true, detail: `prettier did not run: ${res.stderr.trim().slice(0, 400)}` };
  }
  const lines = res.stdout
    .split('\n')
    .filter((l) => l.trim() !== '')
    .map((l) => `${l} is not formatted (npm run format)`);
  return { name: 'format', problems: lines.length, fails: true, detail: lines.join('\n') };
}

/** Top folders whose every subfolder DEVELOPERS.md's Layout must name. */
const LAID_OUT = ['shared', 'server', 'src', 'tests', 'scripts'];

function layout(): LintCheck {
  // A newcomer finds a feature from the folder names and DEVELOPERS.md's Layout: the two must agree.
  const text = readFileSync(join(root, 'DEVELOPERS.md'), 'utf8');
  const block = /## Layout\n```\n([\s\S]*?)```/.exec(text)?.[1];
  if (!block) return { name: 'layout', problems: 1, fails: true, detail: 'DEVELOPERS.md has no Layout block' };
  const lines = block.split('\n');
  const missing: string[] = [];
  for (const top of LAID_OUT) {
    // The top folder's lines: from `top/` to the next line that starts at the margin.
    const start = lines.findIndex((l) => l.startsWith(`${top}/`));
    if (start < 0) {
      missing.push(`${top}/`);
      continue;
    }
    const end = lines.findIndex((l, i) => i > start && /^\S/.test(l));
    const section = lines.slice(start + 1, end < 0 ? undefined : end);
    for (const sub of readdirSync(join(root, top), { withFileTypes: true })) {
      if (!sub.isDirectory()) continue;
      if (!section.some((l) => new RegExp(`^\\s+(\\S+/)?${sub.name}/`).test(l))) missing.push(`${top}/${sub.name}/`);
    }
  }
  return {
    name: 'layout',
    problems: missing.length,
    fails: true,
    detail: missing.map((m) => `${m} is not in DEVELOPERS.md's Layout`).join('\n'),
  };
}

/** Folders whose TypeScript files must open with a comment saying what the file is for. */
const HEADED = ['shared', 'server', 'src', 'tests', 'scripts', 'migrations'];

/** True when the file's first non-blank line is a comment (a `#!` line may come before it). */
export function opensWithComment(text: string): boolean {
  const lines = text.split('\n').filter((l) => l.trim() !== '');
  const first = lines[0]?.startsWith('#!') ? lines[1] : lines[0];
  return first !== undefined && /^\s*(\/\/|\/\*)/.test(first);
}

function headers(): LintCheck {
  // A newcomer opening any file reads first what it is for.
  const res = run('git', ['ls-files', '--cached', '--others', '--exclude-standard', '--', ...HEADED]);
  const files = res.stdout
    .split('\n')
    .filter((f) => /\.(ts|tsx|mts)$/.test(f) && !f.endsWith('.d.ts') && existsSync(join(root, f)));
  const bare = files.filter((f) => !opensWithComment(readFileSync(join(root, f), 'utf8')));
  return {
    name: 'headers',
    problems: bare.length,
    fails: true,
    detail: bare.map((f) => `${f} does not open with a comment saying what it is for`).join('\n'),
  };
}

export function lintChecks(): LintCheck[] {
  return [eslint(), imports(), duplicates(), formatting(), layout(), headers()];
}

export function printChecks(checks: LintCheck[]): void {
  for (const c of checks) {
    const verdict = c.problems === 0 ? 'clean' : c.fails ? `${c.problems} problem(s)` : `${c.problems} reported`;
    console.log(`[lint] ${c.name}: ${verdict}`);
    if (c.problems > 0 && c.detail)
      console.log(
        c.detail
          .split('\n')
          .map((l) => `  ${l}`)
          .join('\n'),
      );
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const checks = lintChecks();
  printChecks(checks);
  process.exit(checks.some((c) => c.fails && c.problems > 0) ? 1 : 0);
}
