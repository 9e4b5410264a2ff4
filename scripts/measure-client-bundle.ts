// Builds the client in memory and measures what the client's page (/p/<token>) downloads: the
// gzip size of its entry and every chunk it imports statically, then of the 3D view it loads
// lazily. Also lists any designer module that found its way into that graph (there must be none).
//   npx tsx scripts/measure-client-bundle.ts
import { gzipSync } from 'node:zlib';
import { resolve, relative } from 'node:path';
import { build } from 'vite';

const root = resolve(import.meta.dirname, '..');
export const PRESENTATION_ENTRY = 'src/features/client-page/presentation.html';

/** Modules only the designer's app may carry: every feature but the client page, the app shell, the session. */
export const DESIGNER_MODULE = /^src\/(?:app\/|lib\/session|features\/(?!client-page\/))/;

interface Chunk {
  fileName: string;
  code: string;
  isEntry: boolean;
  facadeModuleId: string | null;
  imports: string[];
  dynamicImports: string[];
  moduleIds: string[];
}

export interface ChunkSize {
  file: string;
  gzipBytes: number;
}

export interface ClientBundleReport {
  /** The entry and its static imports: what loads before the page can show anything. */
  initial: ChunkSize[];
  initialGzipBytes: number;
  /** Chunks loaded later by dynamic import (the 3D view), not counting the initial ones again. */
  lazy: ChunkSize[];
  lazyGzipBytes: number;
  /** Source modules (relative to the project) in each part of the graph. */
  initialModules: string[];
  lazyModules: string[];
  /** The designer's app entry, for comparison. */
  appInitialGzipBytes: number;
}

async function buildInMemory(): Promise<Chunk[]> {
  // Under a test runner NODE_ENV is "test", which would measure React's development build.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  let out: Awaited<ReturnType<typeof build>>;
  try {
    out = await build({
      root,
      mode: 'production',
      configFile: resolve(root, 'vite.config.ts'),
      logLevel: 'silent',
      build: { write: false },
    });
  } finally {
    if (nodeEnv === undefined) delete process.env.NODE_ENV;
    else process.env.NODE_ENV = nodeEnv;
  }
  const outputs = Array.isArray(out) ? out : [out];
  const chunks: Chunk[] = [];
  for (const o of outputs) {
    if (!('output' in o)) throw new Error('Expected a finished build, not a watcher.');
    for (const item of o.output) if (item.type === 'chunk') chunks.push(item as unknown as Chunk);
  }
  return chunks;
}

function closure(start: Chunk[], byFile: Map<string, Chunk>, follow: (c: Chunk) => string[]): Chunk[] {
  const seen = new Map<string, Chunk>();
  const stack = [...start];
  while (stack.length > 0) {
    const c = stack.pop()!;
    if (seen.has(c.fileName)) continue;
    seen.set(c.fileName, c);
    for (const f of follow(c)) stack.push(byFile.get(f)!);
  }
  return [...seen.values()];
}

const sizeOf = (c: Chunk): ChunkSize => ({ file: c.fileName, gzipBytes: gzipSync(c.code, { level: 9 }).length });
const sum = (sizes: ChunkSize[]) => sizes.reduce((n, s) => n + s.gzipBytes, 0);
const modulesOf = (chunks: Chunk[]) =>
  [...new Set(chunks.flatMap((c) => c.moduleIds))].map((id) => relative(root, id.replace(/^\0/, '').replace(/\?.*$/, ''))).sort();

function entry(chunks: Chunk[], html: string): Chunk {
  const found = chunks.find((c) => c.isEntry && c.facadeModuleId !== null && relative(root, c.facadeModuleId) === html);
  if (!found) throw new Error(`No entry chunk for ${html}.`);
  return found;
}

export async function measureClientBundle(): Promise<ClientBundleReport> {
  const chunks = await buildInMemory();
  const byFile = new Map(chunks.map((c) => [c.fileName, c]));
  const statics = (c: Chunk) => c.imports;
  const initial = closure([entry(chunks, PRESENTATION_ENTRY)], byFile, statics);
  const everything = closure(initial, byFile, (c) => [...c.imports, ...c.dynamicImports]);
  const lazy = everything.filter((c) => !initial.includes(c));
  const app = closure([entry(chunks, 'index.html')], byFile, statics);
  return {
    initial: initial.map(sizeOf),
    initialGzipBytes: sum(initial.map(sizeOf)),
    lazy: lazy.map(sizeOf),
    lazyGzipBytes: sum(lazy.map(sizeOf)),
    initialModules: modulesOf(initial),
    lazyModules: modulesOf(lazy),
    appInitialGzipBytes: sum(app.map(sizeOf)),
  };
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

if (import.meta.url === `file://${process.argv[1]}`) {
  const r = await measureClientBundle();
  console.log('Client page (/p/<token>), gzip:');
  for (const c of r.initial) console.log(`  initial  ${kb(c.gzipBytes).padStart(9)}  ${c.file}`);
  for (const c of r.lazy) console.log(`  3D view  ${kb(c.gzipBytes).padStart(9)}  ${c.file}`);
  console.log(
    `  before the page shows: ${kb(r.initialGzipBytes)}; with the 3D view: ${kb(r.initialGzipBytes + r.lazyGzipBytes)}`,
  );
  console.log(`Designer app entry for comparison: ${kb(r.appInitialGzipBytes)}`);
  const designer = [...r.initialModules, ...r.lazyModules].filter((m) => DESIGNER_MODULE.test(m));
  console.log(
    designer.length === 0 ? 'No designer modules in the client page.' : `Designer modules found:\n  ${designer.join('\n  ')}`,
  );
  const heaviest = new Map<string, number>();
  for (const m of r.initialModules) {
    const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(m)?.[1] ?? m.split('/').slice(0, 2).join('/');
    heaviest.set(pkg, (heaviest.get(pkg) ?? 0) + 1);
  }
  if (process.argv.includes('--modules'))
    console.log(
      [...heaviest.entries()]
        .sort((a, b) => b[1] - a[1])
        .map(([k, n]) => `  ${n}\t${k}`)
        .join('\n'),
    );
  process.exit(designer.length === 0 ? 0 : 1);
}
