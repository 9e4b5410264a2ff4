// Scene data for a typical room's pieces: plain boxes against forms, the same room in the same run:
// warm (the engine has compiled the code: forms built from nothing and kept from the last build)
// and as the page's first build (each in a fresh process, nothing compiled yet).
import { buildPieceForms, clearFormCache } from '../../shared/geometry/forms/piece-forms';
import { formTriangles } from '../../shared/geometry/forms/mesh';
import { buildRoomScene } from '../../shared/geometry/scene';
import { loadavg } from 'node:os';
import { runFresh, serveAsWorker } from './fresh-process';
import { typicalFurnishedRoom } from './typical-room';

/** Rounds of the three measures, each round's batches taken in turn, so a busy spell on the shared machine hits them all alike. */
const ROUNDS = 7;
/** Batches per measure and round (the median is kept) and builds per batch. */
const REPEATS = 9;
const BATCH = 20;
/** Drag steps cycled through by the kept measure. */
const MOVES = 400;
/** Fresh processes per build for the first build, boxes and forms taken in turn (who goes first alternating). */
const FRESH_RUNS = 15;
const WORKER_FLAG = '--forms-first-build-worker';

interface Timing {
  wall: number;
  cpu: number;
}

/** One batch of `run`: wall and process CPU time, ms per build. */
function batch(run: () => void): Timing {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  for (let i = 0; i < BATCH; i++) run();
  const wall = (performance.now() - t0) / BATCH;
  const c = process.cpuUsage(c0);
  return { wall, cpu: (c.user + c.system) / 1000 / BATCH };
}

/**
 * Batches of every measure taken in turn (one of each, again and again), so a busy spell or a
 * collection of the garbage left by one measure falls on them all alike; the median batch of each
 * by wall time.
 */
function medians(runs: readonly (() => void)[]): Timing[] {
  const timings: Timing[][] = runs.map(() => []);
  for (let r = 0; r < REPEATS; r++) runs.forEach((run, i) => timings[i]!.push(batch(run)));
  return timings.map((ts) => [...ts].sort((a, b) => a.wall - b.wall)[Math.floor(REPEATS / 2)]!);
}

const range = (values: number[], digits: number, unit = '') => {
  const sorted = [...values].sort((a, b) => a - b);
  return `${sorted[0]!.toFixed(digits)}–${sorted[sorted.length - 1]!.toFixed(digits)}${unit}`;
};
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

type FirstBuild = 'boxes' | 'forms';
interface FirstBuildTiming {
  wall: number;
  cpu: number;
  /** Of the forms alone (0 for boxes). */
  formsWall: number;
}

/**
 * In a fresh worker: the room's scene data built once, as the page does when it has loaded: the
 * shell and boxes, then (for forms) every piece's form. Garbage from loading is collected first, so
 * a collection it would cause falls on neither build by chance.
 */
function firstBuild(build: FirstBuild): FirstBuildTiming {
  const { shell, option } = typicalFurnishedRoom();
  (globalThis as { gc?: () => void }).gc?.();
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  buildRoomScene(shell, option);
  const t1 = performance.now();
  if (build === 'forms') buildPieceForms(option.pieces);
  const t2 = performance.now();
  const c = process.cpuUsage(c0);
  return { wall: t2 - t0, cpu: (c.user + c.system) / 1000, formsWall: t2 - t1 };
}

/**
 * The first build of the room in fresh processes, boxes and forms taken in turn (which goes first
 * alternating): wall and process CPU time, medians with their ranges, and the load.
 */
function benchFirstBuild(): void {
  const runs: Record<FirstBuild, FirstBuildTiming[]> = { boxes: [], forms: [] };
  const loads: number[] = [];
  for (let i = 0; i < FRESH_RUNS; i++) {
    const order: FirstBuild[] = i % 2 === 0 ? ['boxes', 'forms'] : ['forms', 'boxes'];
    for (const build of order)
      runs[build].push(runFresh<FirstBuildTiming>(import.meta.url, WORKER_FLAG, [build], ['--expose-gc']));
    loads.push(loadavg()[0]!);
  }
  const wall = (b: FirstBuild) => runs[b].map((r) => r.wall);
  const cpu = (b: FirstBuild) => runs[b].map((r) => r.cpu);
  console.log(
    `forms: first build after the page loads (a fresh process each, nothing compiled yet; ${FRESH_RUNS} of each, ` +
      `in turn): boxes median ${median(wall('boxes')).toFixed(2)} ms (${range(wall('boxes'), 2, ' ms')}; CPU ` +
      `${median(cpu('boxes')).toFixed(2)} ms), forms median ${median(wall('forms')).toFixed(2)} ms ` +
      `(${range(wall('forms'), 2, ' ms')}; CPU ${median(cpu('forms')).toFixed(2)} ms; the forms' own part ` +
      `${median(runs.forms.map((r) => r.formsWall)).toFixed(2)} ms): ${(median(wall('forms')) / median(wall('boxes'))).toFixed(2)}× ` +
      `the boxes (CPU ${(median(cpu('forms')) / median(cpu('boxes'))).toFixed(2)}×) (load ${range(loads, 1)}; budget: forms ≤ 1.5× the boxes)`,
  );
}

/**
 * Prints ms per room for the scene data with boxes and with forms (shell and boxes included in
 * both, as the 3D views build them), round by round with the load, then the ranges and ratios.
 */
export async function benchForms(): Promise<void> {
  const { shell, option } = typicalFurnishedRoom();
  const boxes = () => buildRoomScene(shell, option);
  // From nothing (a room opened for the first time) and again (a piece dragged: the others' forms are kept).
  const cold = () => {
    clearFormCache();
    buildRoomScene(shell, option);
    buildPieceForms(option.pieces);
  };
  // A drag: each build one piece moved a little (a different piece and distance each time, so it
  // is written again), the others where they were.
  const moves = Array.from({ length: MOVES }, (_, k) => ({
    pieces: option.pieces.map((p, i) =>
      i === k % option.pieces.length ? { ...p, x: p.x + 1 + Math.floor(k / option.pieces.length) } : p,
    ),
  }));
  let move = 0;
  const kept = () => {
    const moved = moves[move++ % MOVES]!;
    buildRoomScene(shell, moved);
    buildPieceForms(moved.pieces);
  };
  for (let i = 0; i < 30; i++) {
    boxes();
    cold();
    kept();
  }
  const rounds: { boxes: number; cold: number; kept: number; coldCpu: number; load: number }[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    const [b, c, k] = medians([boxes, cold, kept]) as [Timing, Timing, Timing];
    const round = { boxes: b.wall, cold: c.wall, kept: k.wall, coldCpu: c.cpu / b.cpu, load: loadavg()[0]! };
    rounds.push(round);
    console.log(
      `forms: round ${r + 1}: boxes ${round.boxes.toFixed(3)} ms, forms from nothing ${round.cold.toFixed(3)} ms ` +
        `(${(round.cold / round.boxes).toFixed(2)}×; process CPU time ${round.coldCpu.toFixed(2)}×), ` +
        `forms kept ${round.kept.toFixed(3)} ms (${(round.kept / round.boxes).toFixed(2)}×) (load ${round.load.toFixed(1)})`,
    );
  }
  const triangles = buildPieceForms(option.pieces).reduce((n, f) => n + formTriangles(f.meshes), 0);
  const kinds = new Set(option.pieces.map((p) => p.kind)).size;
  console.log(
    `forms: scene data, typical room of 40 pieces (${kinds} kinds), ${ROUNDS} rounds side by side: ` +
      `boxes ${range(
        rounds.map((r) => r.boxes),
        3,
        ' ms',
      )}; with forms built from nothing ${range(
        rounds.map((r) => r.cold),
        3,
        ' ms',
      )} (${range(
        rounds.map((r) => r.cold / r.boxes),
        2,
        '×',
      )}; process CPU time ${range(
        rounds.map((r) => r.coldCpu),
        2,
        '×',
      )}); with forms kept from the last build (one piece moved) ${range(
        rounds.map((r) => r.kept),
        3,
        ' ms',
      )} (${range(
        rounds.map((r) => r.kept / r.boxes),
        2,
        '×',
      )}); forms ${triangles} triangles (load ${range(
        rounds.map((r) => r.load),
        1,
      )}; budget: forms ≤ 1.5× the boxes)`,
  );
  benchFirstBuild();
}

await serveAsWorker(WORKER_FLAG, ([build]) => Promise.resolve(firstBuild(build as FirstBuild)));
