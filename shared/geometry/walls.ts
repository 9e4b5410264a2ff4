// Walls laid out round a room outline in plan mm: each wall's inside and outside faces, grown outward
// by its thickness and mitred (or cut square) at the corners, and the outside ring of the walls.
import { DEFAULT_WALL_THICKNESS_MM, type RoomShell } from '../schemas/room';
import { windingSign } from './polygon';
import { MITRE_LIMIT_THICKNESSES, PARALLEL_SINE_TOLERANCE, POINT_TOLERANCE_MM } from './tolerances';
import { add, addScaled, cross, distance, dot, normalise, scale, sub, type Vec2 } from './vec';

/**
 * A square-cut join at a corner where a mitre would reach too far (very sharp corners, near-parallel
 * walls of different thickness): the outer faces stop at `from` and `to` and a short face joins them.
 */
export interface WallJoin {
  /** The inside corner, plan mm. */
  corner: [number, number];
  /** End of the previous wall's outside face, plan mm. */
  from: [number, number];
  /** Start of this wall's outside face, plan mm. */
  to: [number, number];
  /** Horizontal unit normal of the joining face, pointing away from the wall body. */
  normal: [number, number];
}

/** Wall i of the outline in plan mm: inside face from corner i to i+1, grown outward by its thickness. */
export interface WallLayout {
  index: number;
  /** Inside face ends, plan mm. */
  start: [number, number];
  end: [number, number];
  lengthMm: number;
  /** Unit vector from start to end. */
  direction: [number, number];
  /** Unit vector pointing out of the room, whichever way the outline winds. */
  outward: [number, number];
  thicknessMm: number;
  /** Outside face ends after mitring with the neighbouring walls, plan mm. */
  outerStart: [number, number];
  outerEnd: [number, number];
  /** Where the outside face starts and ends, measured along `direction` from `start` (mm; negative past the corner). */
  outerFromMm: number;
  outerToMm: number;
  /** A square-cut join at this wall's start corner, or null where the mitre meets cleanly. */
  startJoin: WallJoin | null;
}

/** Thickness (mm) of wall `index` of a shell: its override, else the room's wall thickness. */
export function wallThicknessMm(shell: Pick<RoomShell, 'wallThickness' | 'wallThicknesses'>, index: number): number {
  return shell.wallThicknesses?.[index] ?? shell.wallThickness ?? DEFAULT_WALL_THICKNESS_MM;
}

interface Corner {
  endOfPrevious: [number, number];
  startOfNext: [number, number];
  join: WallJoin | null;
}

// The outer corner is where the two walls' outside lines meet. It falls back to a square cut when the
// walls are (nearly) parallel or the mitre would run further than MITRE_LIMIT_THICKNESSES.
function outerCorner(corner: Vec2, dPrev: Vec2, nPrev: Vec2, tPrev: number, dNext: Vec2, nNext: Vec2, tNext: number): Corner {
  const prevPoint = addScaled(corner, nPrev, tPrev);
  const nextPoint = addScaled(corner, nNext, tNext);
  const sine = cross(dPrev, dNext);
  if (Math.abs(sine) > PARALLEL_SINE_TOLERANCE) {
    const w = sub(nextPoint, prevPoint);
    const along = cross(w, dNext) / sine;
    const mitre = addScaled(prevPoint, dPrev, along);
    if (distance(mitre, corner) <= MITRE_LIMIT_THICKNESSES * Math.max(tPrev, tNext)) {
      return { endOfPrevious: mitre, startOfNext: mitre, join: null };
    }
  } else if (dot(dPrev, dNext) > 0 && distance(prevPoint, nextPoint) < POINT_TOLERANCE_MM) {
    // Straight through with equal thickness: the outside faces simply continue.
    return { endOfPrevious: prevPoint, startOfNext: prevPoint, join: null };
  }
  const span = sub(nextPoint, prevPoint);
  let normal = normalise([span[1], -span[0]]);
  const away = sub(scale(add(prevPoint, nextPoint), 0.5), corner);
  if (Math.abs(dot(normal, away)) < POINT_TOLERANCE_MM) {
    // A step between straight walls of different thickness faces along the thinner wall.
    normal = tPrev > tNext ? [dPrev[0], dPrev[1]] : [-dPrev[0], -dPrev[1]];
  } else if (dot(normal, away) < 0) {
    normal = [-normal[0], -normal[1]];
  }
  return {
    endOfPrevious: prevPoint,
    startOfNext: nextPoint,
    join: { corner: [corner[0], corner[1]], from: prevPoint, to: nextPoint, normal },
  };
}

/** Walls of a plan outline (mm) with per-wall thicknesses (mm), mitred at every corner. */
export function layoutWalls(outline: readonly Vec2[], thicknessesMm: readonly number[]): WallLayout[] {
  const n = outline.length;
  const sign = windingSign(outline);
  const directions = outline.map((p, i) => normalise(sub(outline[(i + 1) % n]!, p)));
  // For a clockwise (on the plan) outline the room lies to the left in y-up terms, so outward is (dy, −dx).
  const outwards = directions.map((d): [number, number] => [sign * d[1], -sign * d[0]]);
  const corners = outline.map((corner, i) => {
    const prev = (i + n - 1) % n;
    return outerCorner(
      corner,
      directions[prev]!,
      outwards[prev]!,
      thicknessesMm[prev]!,
      directions[i]!,
      outwards[i]!,
      thicknessesMm[i]!,
    );
  });
  return outline.map((start, i) => {
    const next = (i + 1) % n;
    const end = outline[next]!;
    const outerStart = corners[i]!.startOfNext;
    const outerEnd = corners[next]!.endOfPrevious;
    return {
      index: i,
      start: [start[0], start[1]],
      end: [end[0], end[1]],
      lengthMm: distance(start, end),
      direction: directions[i]!,
      outward: outwards[i]!,
      thicknessMm: thicknessesMm[i]!,
      outerStart,
      outerEnd,
      outerFromMm: dot(sub(outerStart, start), directions[i]!),
      outerToMm: dot(sub(outerEnd, start), directions[i]!),
      startJoin: corners[i]!.join,
    };
  });
}

/** Walls of a room shell (plan mm), using its default thickness and per-wall overrides. */
export function layoutShellWalls(shell: Pick<RoomShell, 'outline' | 'wallThickness' | 'wallThicknesses'>): WallLayout[] {
  const thicknesses = shell.outline.map((_, i) => wallThicknessMm(shell, i));
  return layoutWalls(shell.outline, thicknesses);
}

/** The outside ring of the walls (plan mm), in the outline's winding, including square-cut joins. */
export function outerRingMm(walls: readonly WallLayout[]): [number, number][] {
  const ring: [number, number][] = [];
  for (const wall of walls) {
    if (wall.startJoin) ring.push(wall.startJoin.from, wall.startJoin.to);
    else ring.push(wall.outerStart);
  }
  return ring;
}
