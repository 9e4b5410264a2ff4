// Piece model processing: time and peak memory to check and normalise a model near the 25 MB upload
// limit (a dense cushion of about 416,000 vertices and a 2,048 px photo-like texture), in a fresh Node
// process that only reads the file and processes it, so its peak resident memory (getrusage maxRSS)
// is the processing's own plus Node's baseline. The load average is printed beside each figure.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { maxRssMb, rssVerdict, runFresh, serveAsWorker } from './fresh-process';
import { MODEL_LIMITS } from '../../shared/schemas/piece-model';
import { photoLike, rawToSharp } from '../../server/services/images/generate';
import { checkModelFile } from '../../server/services/gltf/check-gltf';
import { normaliseModel } from '../../server/services/gltf/normalise-model';
import { chairDocument, toGlb } from '../../server/services/gltf/test-models';

const REPEATS = 3;
/** The budget from the issue: peak memory processing a 25 MB model. */
const TARGET_RSS_MB = 500;
const WORKER_FLAG = '--models-worker';

interface WorkerResult {
  checkMs: number[];
  normaliseMs: number[];
  triangles: { before: number; after: number };
  outBytes: number;
  maxRssMb: number;
  baselineRssMb: number;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const load = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

async function work(file: string): Promise<WorkerResult> {
  const baselineRssMb = process.memoryUsage().rss / (1024 * 1024);
  const bytes = readFileSync(file);
  const checkMs: number[] = [];
  const normaliseMs: number[] = [];
  let last;
  for (let i = 0; i < REPEATS; i++) {
    let started = performance.now();
    await checkModelFile(bytes);
    checkMs.push(performance.now() - started);
    started = performance.now();
    last = await normaliseModel(bytes);
    normaliseMs.push(performance.now() - started);
  }
  return {
    checkMs,
    normaliseMs,
    triangles: { before: last!.sourceTriangles, after: last!.triangles },
    outBytes: last!.glb.length,
    maxRssMb: maxRssMb(),
    baselineRssMb,
  };
}

/** A model just under the upload limit: the chair with a dense cushion and a large, busy texture. */
async function heavyModel(): Promise<Buffer> {
  const doc = await chairDocument({ cushionSegments: 645 });
  const png = await rawToSharp(photoLike(2048, 2048)).png({ compressionLevel: 9 }).toBuffer();
  doc.getRoot().listTextures()[0].setImage(new Uint8Array(png));
  return toGlb(doc);
}

export async function benchModels(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'parlour-bench-models-'));
  try {
    const model = await heavyModel();
    if (model.length > MODEL_LIMITS.maxFileBytes) throw new Error(`bench model is ${model.length} bytes, over the limit`);
    const file = join(dir, 'heavy.glb');
    writeFileSync(file, model);
    const before = load();
    const r = runFresh<WorkerResult>(import.meta.url, WORKER_FLAG, [file]);
    const range = (xs: number[]) =>
      `${median(xs).toFixed(0)} ms median (${Math.min(...xs).toFixed(0)}–${Math.max(...xs).toFixed(0)})`;
    console.log(
      `models: ${(model.length / 1024 / 1024).toFixed(1)} MB .glb, ${r.triangles.before.toLocaleString('en-GB')} triangles, 2,048 px PNG texture; ${REPEATS} runs in one process; load ${before} → ${load()}`,
    );
    console.log(`models: upload check ${range(r.checkMs)}`);
    console.log(
      `models: normalising ${range(r.normaliseMs)} → ${r.triangles.after.toLocaleString('en-GB')} triangles, ${(r.outBytes / 1024 / 1024).toFixed(2)} MB .glb`,
    );
    console.log(
      `models: peak rss ${r.maxRssMb.toFixed(0)} MB (Node and the libraries loaded: ${r.baselineRssMb.toFixed(0)} MB) — ${rssVerdict(r.maxRssMb, TARGET_RSS_MB)}`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (!(await serveAsWorker(WORKER_FLAG, ([file]) => work(file))) && process.argv[1] === fileURLToPath(import.meta.url)) {
  await benchModels();
}
