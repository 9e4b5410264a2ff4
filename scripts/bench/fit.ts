import { placedBoxes, type PieceBox } from '../../shared/analysis/fit/boxes';
import { findDoorSwings } from '../../shared/analysis/fit/door-swing';
import { findTooBigForDoor } from '../../shared/analysis/fit/door-fit';
import { checkFit } from '../../shared/analysis/fit/index';
import { findOutsideRoom } from '../../shared/analysis/fit/outside-room';
import { findOverlaps } from '../../shared/analysis/fit/overlap';
import { findWalkwayProblems } from '../../shared/analysis/fit/walkway';
import { findBlockedWindows } from '../../shared/analysis/fit/window';
import { DEFAULT_WALKWAY_MM } from '../../shared/analysis/takeoff';
import { optionDocSchema, type Piece } from '../../shared/schemas/option';
import type { RoomShell } from '../../shared/schemas/room';
import { typicalRoom } from './typical-room';

/** Repeats of each check, so one slow garbage collection does not decide the figure. */
const REPEATS = 30;
/** What a fit check should take for a typical room (ms): one frame at 60 frames a second, so the editor can check as a piece is dragged. */
const TYPICAL_BUDGET_MS = 16;

/** The typical room's shell, 5 times its floor area, with 200 pieces in a grid (invented, plan mm). */
function largeRoom(): { shell: RoomShell; pieces: Piece[] } {
  const { shell } = typicalRoom();
  const grown: RoomShell = { ...shell, outline: shell.outline.map(([x, y]) => [x * Math.sqrt(5), y * Math.sqrt(5)]) };
  const pieces = Array.from({ length: 200 }, (_, i) => ({
    id: `piece-${i}`,
    name: `Piece ${i}`,
    x: 600 + (i % 20) * 620,
    y: 600 + Math.floor(i / 20) * 1050,
    width: 450,
    depth: 350,
    height: 450 + (i % 5) * 100,
    rotation: (i * 37) % 360,
    elevation: i % 7 === 0 ? 1400 : 0,
    status: 'new',
  }));
  return { shell: grown, pieces: optionDocSchema.parse({ pieces }).pieces };
}

function medianMs(run: () => void): { median: number; best: number } {
  for (let i = 0; i < 5; i++) run();
  const times: number[] = [];
  for (let i = 0; i < REPEATS; i++) {
    const started = performance.now();
    run();
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return { median: times[Math.floor(REPEATS / 2)], best: times[0] };
}

/** Prints milliseconds per fit check (and for all of them) on a typical room of 40 pieces and a large one of 200. */
export async function benchFit(): Promise<void> {
  const typical = typicalRoom();
  const large = largeRoom();
  const rooms: [string, RoomShell, readonly Piece[]][] = [
    ['typical room, 8 walls, 6 openings, 40 pieces', typical.shell, typical.option.pieces],
    ['large room, 8 walls, 6 openings, 200 pieces', large.shell, large.pieces],
  ];
  for (const [name, shell, pieces] of rooms) {
    const boxes: PieceBox[] = placedBoxes(pieces);
    const checks: [string, () => unknown][] = [
      ['overlap', () => findOverlaps(boxes)],
      ['outside-room', () => findOutsideRoom(shell, boxes)],
      ['door-swing', () => findDoorSwings(shell, boxes)],
      ['window-blocked', () => findBlockedWindows(shell, boxes)],
      ['walkway (narrow-walkway, unreachable)', () => findWalkwayProblems(shell, boxes, DEFAULT_WALKWAY_MM)],
      ['too-big-for-door', () => findTooBigForDoor(shell, boxes)],
      ['checkFit, all checks', () => checkFit(shell, pieces)],
    ];
    for (const [check, run] of checks) {
      const { median, best } = medianMs(run);
      console.log(`fit: ${name}: ${check}: ${median.toFixed(3)} ms median, ${best.toFixed(3)} best (${REPEATS} runs)`);
    }
  }
  const total = medianMs(() => checkFit(typical.shell, typical.option.pieces)).median;
  console.log(`fit: typical room all checks ${total.toFixed(1)} ms, budget ${TYPICAL_BUDGET_MS} ms: ${total < TYPICAL_BUDGET_MS ? 'within' : 'OVER'}`);
}
