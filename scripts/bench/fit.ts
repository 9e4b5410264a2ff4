// The fit check timed beside the frozen copy of the one it replaced (scripts/bench/reference-fit):
// runs alternate between the two, so whatever else the machine is doing weighs on both alike. Two
// ways: as a drag checks it (one piece a step further each run, today's check keeping its widths
// from the run before, as the editor's worker does), and as the first check of a room (today's
// widths dropped before every run).
import { loadavg } from 'node:os';
import { placedBoxes, type PieceBox } from '../../shared/analysis/fit/boxes';
import { findDoorSwings } from '../../shared/analysis/fit/door-swing';
import { findTooBigForDoor } from '../../shared/analysis/fit/door-fit';
import { checkFit } from '../../shared/analysis/fit/index';
import { findOutsideRoom } from '../../shared/analysis/fit/outside-room';
import { findOverlaps } from '../../shared/analysis/fit/overlap';
import { findWalkwayProblems } from '../../shared/analysis/fit/walkway';
import { forgetKeptWidths } from '../../shared/analysis/fit/walkway-floor';
import { findBlockedWindows } from '../../shared/analysis/fit/window';
import { DEFAULT_WALKWAY_MM } from '../../shared/analysis/fit/clearances';
import type { Piece } from '../../shared/schemas/option';
import type { RoomShell } from '../../shared/schemas/room';
import { checkFit as referenceCheckFit } from './reference-fit/index';
import { findWalkwayProblems as referenceWalkway } from './reference-fit/walkway';
import { largeRoom, typicalRoom } from './typical-room';

/** Timed runs of each check, so one slow garbage collection does not decide the figure. */
const REPEATS = 30;
/** Untimed runs of each first, so both are timed as compiled for a drag's many checks, not as first run. */
const WARM_UPS = 20;
/** What a fit check should take for a typical room (ms): one frame at 60 frames a second, so the editor can check as a piece is dragged. */
const TYPICAL_BUDGET_MS = 16;
/** Wanted: today's checks this many times faster than the reference while a piece is dragged, typical room and 200 pieces. */
const WANTED_RATIO = { typical: 5, large: 4 };
/** Steps each dragged piece takes, round a small square and back to where it stood. */
const DRAG_STEPS = 16;
/** How far (mm) the dragged piece moves between two checks: a pointer's step at a brisk drag (common practice). */
const DRAG_STEP_MM = 20;

interface Spread {
  median: number;
  min: number;
  max: number;
}

function spread(times: number[]): Spread {
  const sorted = [...times].sort((a, b) => a - b);
  return { median: sorted[Math.floor(sorted.length / 2)], min: sorted[0], max: sorted[sorted.length - 1] };
}

interface Timed {
  /** Elapsed time. */
  wall: Spread;
  /** This process's processor time (user + system): what other work on the machine does not add to. */
  cpu: Spread;
}

function timeOnce(run: () => unknown, wall: number[], cpu: number[]): void {
  const cpuBefore = process.cpuUsage();
  const started = performance.now();
  run();
  wall.push(performance.now() - started);
  const used = process.cpuUsage(cpuBefore);
  cpu.push((used.user + used.system) / 1000);
}

/** Medians and ranges (ms) of two functions of the run's number run alternately, `repeats` times after `warmUps` untimed runs of each. */
function sideBySide(
  ours: (run: number) => unknown,
  reference: (run: number) => unknown,
  warmUps: number,
  repeats: number,
): { ours: Timed; reference: Timed } {
  for (let i = 0; i < warmUps; i++) {
    ours(i);
    reference(i);
  }
  const times = { oursWall: [], oursCpu: [], refWall: [], refCpu: [] } as Record<string, number[]>;
  for (let i = warmUps; i < repeats + warmUps; i++) {
    timeOnce(() => ours(i), times.oursWall, times.oursCpu);
    timeOnce(() => reference(i), times.refWall, times.refCpu);
  }
  return {
    ours: { wall: spread(times.oursWall), cpu: spread(times.oursCpu) },
    reference: { wall: spread(times.refWall), cpu: spread(times.refCpu) },
  };
}

function alone(run: () => unknown): Spread {
  for (let i = 0; i < WARM_UPS; i++) run();
  const times: number[] = [];
  for (let i = 0; i < REPEATS; i++) {
    const started = performance.now();
    run();
    times.push(performance.now() - started);
  }
  return spread(times);
}

const ms = (s: Spread): string => `${s.median.toFixed(2)} ms median (${s.min.toFixed(2)}–${s.max.toFixed(2)})`;
const load = (): string =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

/**
 * The layouts of drags of the pieces `dragged`, one after another: each walks round a square of
 * DRAG_STEPS steps of DRAG_STEP_MM and back to where it stood, one layout a step, the others left
 * where they are; so every layout is one step from the one before, the last from the first too.
 */
function dragLayouts(pieces: readonly Piece[], dragged: readonly number[]): Piece[][] {
  const side = DRAG_STEPS / 4;
  const offsets = Array.from({ length: DRAG_STEPS }, (_, step) => {
    const along = (step % side) * DRAG_STEP_MM;
    const sideMm = side * DRAG_STEP_MM;
    return [
      [along, 0],
      [sideMm, along],
      [sideMm - along, sideMm],
      [0, sideMm - along],
    ][Math.floor(step / side)]!;
  });
  return dragged.flatMap((index) =>
    offsets.map(([dx, dy]) => pieces.map((p, i) => (i === index ? { ...p, x: p.x + dx!, y: p.y + dy! } : p))),
  );
}

/**
 * Prints milliseconds per fit check on a typical room of 40 pieces and a large one of 200: each
 * check alone, then the walkway check and all checks beside the reference, during a drag and as a
 * room's first check, with the ratio of the medians and the machine's load average (1, 5 and 15
 * minutes) as each was measured.
 */
export async function benchFit(): Promise<void> {
  const typical = typicalRoom();
  const large = largeRoom();
  // The dragged pieces, in turn: near the top wall's door, in the middle, and towards the far walls.
  const rooms: [keyof typeof WANTED_RATIO, string, RoomShell, readonly Piece[], number[]][] = [
    ['typical', 'typical room, 8 walls, 6 openings, 40 pieces', typical.shell, typical.option.pieces, [3, 19, 35]],
    ['large', 'large room, 8 walls, 6 openings, 200 pieces', large.shell, large.pieces, [25, 110, 175]],
  ];
  let missed = false;
  for (const [size, name, shell, pieces, dragged] of rooms) {
    const boxes: PieceBox[] = placedBoxes(pieces);
    const checks: [string, () => unknown][] = [
      ['overlap', () => findOverlaps(boxes)],
      ['outside-room', () => findOutsideRoom(shell, boxes)],
      ['door-swing', () => findDoorSwings(shell, boxes)],
      ['window-blocked', () => findBlockedWindows(shell, boxes)],
      ['too-big-for-door', () => findTooBigForDoor(shell, boxes)],
    ];
    for (const [check, run] of checks) console.log(`fit: ${name}: ${check}: ${ms(alone(run))} (${REPEATS} runs)`);
    const layouts = dragLayouts(pieces, dragged);
    const layoutBoxes = layouts.map(placedBoxes);
    const at = (run: number) => run % layouts.length;
    const fresh =
      <T>(check: (run: number) => T) =>
      (run: number): T => {
        forgetKeptWidths();
        return check(run);
      };
    const walkway = (run: number) => findWalkwayProblems(shell, layoutBoxes[at(run)]!, DEFAULT_WALKWAY_MM);
    const walkwayBefore = (run: number) => referenceWalkway(shell, layoutBoxes[at(run)]!, DEFAULT_WALKWAY_MM);
    const all = (run: number) => checkFit(shell, layouts[at(run)]!);
    const allBefore = (run: number) => referenceCheckFit(shell, layouts[at(run)]!);
    const pairs: [string, 'drag' | 'first', (run: number) => unknown, (run: number) => unknown][] = [
      ['walkway (narrow-walkway, unreachable), during a drag', 'drag', walkway, walkwayBefore],
      ['walkway (narrow-walkway, unreachable), first check of the room', 'first', fresh(walkway), walkwayBefore],
      ['checkFit, all checks, during a drag', 'drag', all, allBefore],
      ['checkFit, all checks, first check of the room', 'first', fresh(all), allBefore],
    ];
    for (const [check, way, ours, reference] of pairs) {
      const before = load();
      forgetKeptWidths();
      // A drag is timed over its whole round, each dragged piece as often, after a round untimed.
      const [warmUps, repeats] = way === 'drag' ? [layouts.length, layouts.length] : [WARM_UPS, REPEATS];
      const timed = sideBySide(ours, reference, warmUps, repeats);
      const ratio = timed.reference.wall.median / timed.ours.wall.median;
      const cpuRatio = timed.reference.cpu.median / timed.ours.cpu.median;
      console.log(
        `fit: ${name}: ${check}: today ${ms(timed.ours.wall)}, reference ${ms(timed.reference.wall)}, ` +
          `${ratio.toFixed(1)}× faster; processor time today ${ms(timed.ours.cpu)}, reference ${ms(timed.reference.cpu)}, ` +
          `${cpuRatio.toFixed(1)}× (${repeats} runs each, alternating; load average ${before} → ${load()})`,
      );
      if (check.startsWith('checkFit') && way === 'drag') {
        const met = ratio >= WANTED_RATIO[size];
        missed ||= !met;
        console.log(
          `fit: ${name}: all checks during a drag ${ratio.toFixed(1)}× faster than the reference, wanted ≥ ${WANTED_RATIO[size]}×: ${met ? 'met' : 'MISSED'}`,
        );
        if (size === 'typical') {
          const total = timed.ours.wall.median;
          console.log(
            `fit: typical room all checks during a drag ${total.toFixed(1)} ms, budget ${TYPICAL_BUDGET_MS} ms: ${total < TYPICAL_BUDGET_MS ? 'within' : 'OVER'}`,
          );
        }
      }
    }
  }
  if (missed) console.log('fit: a wanted ratio was missed');
}
