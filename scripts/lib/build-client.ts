// Builds the client with Vite when any of its inputs is newer than the last build.
import { existsSync, readdirSync, statSync, writeFileSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';

const INPUTS = ['src', 'shared', 'assets', 'index.html', 'vite.config.ts', 'package-lock.json'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const name of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, name)));
  return newest;
}

export function buildClientIfStale(root: string): void {
  const stamp = join(root, 'dist', '.built-from');
  const newest = String(Math.max(...INPUTS.map((p) => newestMtime(join(root, p)))));
  if (existsSync(join(root, 'dist', 'index.html')) && existsSync(stamp) && readFileSync(stamp, 'utf8') === newest) return;
  console.log('Parlour: building the client…');
  const res = spawnSync(process.execPath, [join(root, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (res.status !== 0) throw new Error('The client build failed.');
  writeFileSync(stamp, newest);
}
