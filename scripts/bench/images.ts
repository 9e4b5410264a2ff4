// Photo processing time and peak memory for a 12-megapixel JPEG. Each measurement runs in a fresh
// Node process that only reads the photo and processes it, so its peak resident memory (getrusage
// maxRSS) is the processing's own plus Node's baseline, not the generator's buffers.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { maxRssMb, rssVerdict, runFresh, serveAsWorker } from './fresh-process';
import { centredSquareCrop } from '../../shared/schemas/finish';
import { photoLike, rawToSharp } from '../../server/services/images/generate';
import { processPhoto } from '../../server/services/images/process-photo';

const WIDTH_PX = 4000;
const HEIGHT_PX = 3000; // 12 megapixels, a common phone photo size
const REPEATS = 5;
/** The budget from the issue, per 12 MP photo. */
const TARGET_MS = 1500;
const TARGET_RSS_MB = 300;
const WORKER_FLAG = '--images-worker';

interface WorkerResult {
  uploadMs: number[];
  recropMs: number[];
  firstRssMb: number;
  maxRssMb: number;
  baselineRssMb: number;
}

/** In the worker process: process the photo REPEATS times as an upload, then as re-crops of its kept original. */
async function work(file: string): Promise<WorkerResult> {
  const baselineRssMb = process.memoryUsage().rss / (1024 * 1024);
  const photo = readFileSync(file);
  // Orientation 6 stands the photo up: 3000 × 4000 once oriented.
  const crop = centredSquareCrop(HEIGHT_PX, WIDTH_PX);
  const uploadMs: number[] = [];
  const recropMs: number[] = [];
  let master: Buffer | null = null;
  let firstRssMb = 0;
  for (let i = 0; i < REPEATS; i++) {
    const started = performance.now();
    const out = await processPhoto(photo, { crop, edgeBlend: 'narrow', keepMaster: true });
    uploadMs.push(performance.now() - started);
    master = out.master!.buffer;
    if (i === 0) firstRssMb = maxRssMb();
  }
  for (let i = 0; i < REPEATS; i++) {
    const started = performance.now();
    await processPhoto(master!, { crop, edgeBlend: 'narrow', keepMaster: false });
    recropMs.push(performance.now() - started);
  }
  return { uploadMs, recropMs, firstRssMb, maxRssMb: maxRssMb(), baselineRssMb };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Prints processing time and peak memory for one 12-megapixel JPEG upload, and for a re-crop of its kept original. */
export async function benchImages(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'parlour-bench-'));
  try {
    const file = join(dir, 'photo.jpg');
    const photo = await rawToSharp(photoLike(WIDTH_PX, HEIGHT_PX))
      .withMetadata({ orientation: 6 })
      .withExif({ IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1' } })
      .jpeg({ quality: 90 })
      .toBuffer();
    writeFileSync(file, photo);
    const r = runFresh<WorkerResult>(import.meta.url, WORKER_FLAG, [file]);
    const verdict = (ms: number) => (ms < TARGET_MS ? 'within' : 'OVER');
    console.log(
      `images: ${WIDTH_PX} × ${HEIGHT_PX} JPEG, ${(photo.length / 1e6).toFixed(1)} MB, EXIF orientation 6 + GPS; ${REPEATS} runs each in one process`,
    );
    console.log(
      `images: upload processing ${median(r.uploadMs).toFixed(0)} ms median, ${Math.min(...r.uploadMs).toFixed(0)} best — ${verdict(median(r.uploadMs))} the ${TARGET_MS} ms target`,
    );
    console.log(
      `images: re-crop from the kept original ${median(r.recropMs).toFixed(0)} ms median, ${Math.min(...r.recropMs).toFixed(0)} best`,
    );
    console.log(
      `images: peak rss ${r.firstRssMb.toFixed(0)} MB for the first photo, ${r.maxRssMb.toFixed(0)} MB after all ${REPEATS * 2} ` +
        `(Node and sharp loaded: ${r.baselineRssMb.toFixed(0)} MB) — ${rssVerdict(r.maxRssMb, TARGET_RSS_MB)}`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await serveAsWorker(WORKER_FLAG, ([file]) => work(file));
