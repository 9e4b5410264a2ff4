// Scene data for a typical room's pieces: plain boxes against forms, the same room in the same run:
// warm (the engine has compiled the code: forms built from nothing and kept from the last build),
// then the page's first build with nothing compiled yet (forms-first-build.ts).
import { buildPieceForms, clearFormCache } from '../../shared/geometry/forms/piece-forms';
import { formTriangles } from '../../shared/geometry/forms/mesh';
import { buildRoomScene } from '../../shared/geometry/scene';
import { loadavg } from 'node:os';
import { benchFormsFirstBuild, range } from './forms-first-build';
import { typicalFurnishedRoom } from './typical-room';

/** Rounds of the three measures, each round's batches taken in turn, so a busy spell on the shared machine hits them all alike. */
const ROUNDS = 7;
/** Batches per measure and round (the median is kept) and builds per batch. */
const REPEATS = 9;
const BATCH = 20;
/** Drag steps cycled through by the kept measure. */
const MOVES = 400;

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
  await benchFormsFirstBuild();
}
