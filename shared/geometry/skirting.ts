// Skirting along the inside face of each wall in plan mm: the runs between corners, doors and
// passages (it runs on under windows), and those very runs as one scene mesh. The take-off counts
// the same runs, so what is drawn is what is bought.
import type { RoomShell } from '../schemas/room';
import { MeshWriter, planToScene, sceneDirection, UP, type MeshData, type Vec3 } from './mesh-writer';
import { PARALLEL_SINE_TOLERANCE } from './tolerances';
import { addScaled, cross, type Vec2 } from './vec';
import { layoutShellWalls, type WallLayout } from './walls';

/** Skirting board height above the floor (mm): a usual plain board (common practice, no source). */
export const SKIRTING_HEIGHT_MM = 100;
/** Skirting board thickness off the wall face (mm) (common practice, no source). */
export const SKIRTING_THICKNESS_MM = 18;

/** One straight length of skirting on a wall's inside face, plan mm along the wall from its start corner. */
export interface SkirtingRun {
  wall: number;
  fromMm: number;
  toMm: number;
  lengthMm: number;
  /** True where the run starts (ends) at the wall's corner, false where a door or passage stops it. */
  fromCorner: boolean;
  toCorner: boolean;
}

/** Runs shorter than this (mm) are left out: a sliver between two openings is not fitted. */
const MIN_RUN_MM = 1e-6;

/**
 * The skirting runs of a room shell (plan mm): each wall's inside face from corner to corner, stopped
 * at every door and passage (they reach the floor), running on under windows. Gaps are clipped to
 * the wall and merged where openings touch, so the runs never overlap.
 */
export function skirtingRuns(shell: Pick<RoomShell, 'outline' | 'openings'>): SkirtingRun[] {
  const n = shell.outline.length;
  const gaps: [number, number][][] = shell.outline.map(() => []);
  for (const opening of shell.openings) {
    if (opening.type === 'window' || opening.wall >= n) continue;
    gaps[opening.wall]!.push([opening.offset, opening.offset + opening.width]);
  }
  const runs: SkirtingRun[] = [];
  shell.outline.forEach((corner, wall) => {
    const next = shell.outline[(wall + 1) % n]!;
    const lengthMm = Math.hypot(next[0] - corner[0], next[1] - corner[1]);
    let at = 0;
    let fromCorner = true;
    for (const [from, to] of gaps[wall]!.sort((a, b) => a[0] - b[0])) {
      const stop = Math.min(Math.max(from, 0), lengthMm);
      if (stop - at > MIN_RUN_MM) runs.push({ wall, fromMm: at, toMm: stop, lengthMm: stop - at, fromCorner, toCorner: false });
      if (to > at) {
        at = Math.min(to, lengthMm);
        fromCorner = false;
      }
    }
    if (lengthMm - at > MIN_RUN_MM)
      runs.push({ wall, fromMm: at, toMm: lengthMm, lengthMm: lengthMm - at, fromCorner, toCorner: true });
  });
  return runs;
}

/** Total skirting (mm) of a set of runs. */
export function skirtingLengthMm(runs: readonly SkirtingRun[]): number {
  let total = 0;
  for (const run of runs) total += run.lengthMm;
  return total;
}

// Where the board's front face meets the next (or previous) wall's board front at a corner: the two
// front lines, each SKIRTING_THICKNESS_MM in from its wall, crossed; square where the walls run straight on.
function frontCorner(wall: WallLayout, other: WallLayout, corner: Vec2, thicknessMm: number): Vec2 {
  const own = addScaled(corner, wall.outward, -thicknessMm);
  const sine = cross(wall.direction, other.direction);
  if (Math.abs(sine) < PARALLEL_SINE_TOLERANCE) return own;
  const theirs = addScaled(corner, other.outward, -thicknessMm);
  const along = cross([theirs[0] - own[0], theirs[1] - own[1]], other.direction) / sine;
  return addScaled(own, wall.direction, along);
}

/**
 * The runs as one mesh (scene metres): each board's front face and top, mitred into the next wall's
 * board at corners (inside and outside corners alike), with a square end where a door or passage
 * stops it. The back (against the wall) and the bottom (on the floor) are never seen and left out.
 */
export function skirtingMesh(
  shell: Pick<RoomShell, 'outline' | 'wallThickness' | 'wallThicknesses'>,
  runs: readonly SkirtingRun[],
  heightMm = SKIRTING_HEIGHT_MM,
  thicknessMm = SKIRTING_THICKNESS_MM,
): MeshData {
  const walls = layoutShellWalls(shell);
  const n = walls.length;
  const writer = new MeshWriter();
  const h = heightMm / 1000;
  for (const run of runs) {
    const wall = walls[run.wall];
    if (!wall) continue;
    const backFrom = addScaled(wall.start, wall.direction, run.fromMm);
    const backTo = addScaled(wall.start, wall.direction, run.toMm);
    const frontFrom = run.fromCorner
      ? frontCorner(wall, walls[(run.wall + n - 1) % n]!, wall.start, thicknessMm)
      : addScaled(backFrom, wall.outward, -thicknessMm);
    const frontTo = run.toCorner
      ? frontCorner(wall, walls[(run.wall + 1) % n]!, wall.end, thicknessMm)
      : addScaled(backTo, wall.outward, -thicknessMm);
    const inward: Vec3 = [-wall.outward[0], 0, -wall.outward[1]];
    const l = run.lengthMm / 1000;
    writer.quad(
      [planToScene(frontFrom, 0), planToScene(frontTo, 0), planToScene(frontTo, heightMm), planToScene(frontFrom, heightMm)],
      [
        [0, 0],
        [l, 0],
        [l, h],
        [0, h],
      ],
      inward,
    );
    const t = thicknessMm / 1000;
    writer.quad(
      [
        planToScene(backFrom, heightMm),
        planToScene(backTo, heightMm),
        planToScene(frontTo, heightMm),
        planToScene(frontFrom, heightMm),
      ],
      [
        [0, 0],
        [l, 0],
        [l, t],
        [0, t],
      ],
      UP,
    );
    const ends: [Vec2, Vec2, Vec2][] = [];
    if (!run.fromCorner) ends.push([backFrom, frontFrom, [-wall.direction[0], -wall.direction[1]]]);
    if (!run.toCorner) ends.push([backTo, frontTo, wall.direction]);
    for (const [back, front, normal] of ends) {
      writer.quad(
        [planToScene(back, 0), planToScene(front, 0), planToScene(front, heightMm), planToScene(back, heightMm)],
        [
          [0, 0],
          [t, 0],
          [t, h],
          [0, h],
        ],
        sceneDirection(normal),
      );
    }
  }
  return writer.toMesh();
}
