// Room outlines from a measured walk round the room (wall lengths and turns) or from typed corners:
// how far a walk misses, closing it, the walk that retraces an outline, and interior angles.
import { MIN_WALL_LENGTH_MM, PARALLEL_SINE_TOLERANCE, POINT_TOLERANCE_MM } from './tolerances';
import { windingSign } from './polygon';
import { addScaled, angleDegOf, cross, directionDeg, distance, normalise, normaliseAngleDeg, sub, type Vec2 } from './vec';
import { itemAt } from '../item-at';

/** One measured wall of a walk round the room: its length (mm) and the turn to the next wall. */
export interface WalkStep {
  lengthMm: number;
  /** Change of direction at the wall's end, degrees; 90 when left out. */
  turnDeg?: number;
  /** Which way the walker turns as seen on the plan; 'right' when left out (a clockwise walk on the page). */
  turn?: 'left' | 'right';
}

/** Where the walk starts: corner 0 in plan mm and the first wall's direction (degrees clockwise on the plan from +x). */
export interface WalkStart {
  x: number;
  y: number;
  headingDeg: number;
}

/** How far a walk misses its starting corner. */
export interface WalkClosure {
  /** Distance from the last wall's end back to corner 0, mm. */
  gapMm: number;
  /** The gap as a plan vector from the walk's end to corner 0, mm. */
  dxMm: number;
  dyMm: number;
  /** Heading after the last turn minus the starting heading, degrees in (−180, 180]; 0 for a walk that turns right round. */
  angleErrorDeg: number;
}

export interface WalkResult {
  /** Corner i is where wall i starts, plan mm. */
  corners: [number, number][];
  /** Where the last wall ends (ideally corner 0), plan mm. */
  endMm: [number, number];
  closure: WalkClosure;
}

const ORIGIN: WalkStart = { x: 0, y: 0, headingDeg: 0 };

/** Signed turn in degrees, positive to the right (clockwise on the y-down plan). */
export function signedTurnDeg(step: WalkStep): number {
  const angle = step.turnDeg ?? 90;
  return step.turn === 'left' ? -angle : angle;
}

/** Corners (plan mm) from walking round the room wall by wall, and how far the walk misses closing. */
export function outlineFromWalk(steps: readonly WalkStep[], start: WalkStart = ORIGIN): WalkResult {
  const corners: [number, number][] = [];
  let point: [number, number] = [start.x, start.y];
  let headingDeg = start.headingDeg;
  for (const step of steps) {
    corners.push(point);
    point = addScaled(point, directionDeg(headingDeg), step.lengthMm);
    headingDeg += signedTurnDeg(step);
  }
  const dxMm = start.x - point[0];
  const dyMm = start.y - point[1];
  return {
    corners,
    endMm: point,
    closure: { gapMm: Math.hypot(dxMm, dyMm), dxMm, dyMm, angleErrorDeg: normaliseAngleDeg(headingDeg - start.headingDeg) },
  };
}

/** One wall whose length closeOutline changed, lengths in mm. */
export interface WallLengthChange {
  wall: number;
  measuredMm: number;
  closedMm: number;
}

export interface ClosedOutline {
  corners: [number, number][];
  /** 'last-two-walls' keeps every measured angle and stretches the last two walls; 'last-wall' runs the last wall straight back to corner 0. */
  method: 'last-two-walls' | 'last-wall';
  changes: WallLengthChange[];
}

/**
 * Closes a walk (lengths mm) by changing the last wall(s), returning plan mm corners.
 * Keeping the angles is preferred because designers measure lengths less reliably than right angles.
 */
export function closeOutline(steps: readonly WalkStep[], start: WalkStart = ORIGIN): ClosedOutline {
  const walk = outlineFromWalk(steps, start);
  const n = steps.length;
  const corners = walk.corners.map((c): [number, number] => [c[0], c[1]]);
  if (n >= 3) {
    const from = itemAt(corners, n - 2, 'corner');
    const dA = normalise(sub(itemAt(corners, n - 1, 'corner'), from));
    const dB = normalise(sub(walk.endMm, itemAt(corners, n - 1, 'corner')));
    const denominator = cross(dA, dB);
    if (
      Math.abs(denominator) > PARALLEL_SINE_TOLERANCE &&
      itemAt(steps, n - 2, 'step').lengthMm > 0 &&
      itemAt(steps, n - 1, 'step').lengthMm > 0
    ) {
      // Solve from + a·dA + b·dB = corner 0 for the two lengths a and b.
      const w = sub(itemAt(corners, 0, 'corner'), from);
      const a = cross(w, dB) / denominator;
      const b = cross(dA, w) / denominator;
      if (a >= MIN_WALL_LENGTH_MM && b >= MIN_WALL_LENGTH_MM) {
        corners[n - 1] = addScaled(from, dA, a);
        return {
          corners,
          method: 'last-two-walls',
          changes: [
            { wall: n - 2, measuredMm: itemAt(steps, n - 2, 'step').lengthMm, closedMm: a },
            { wall: n - 1, measuredMm: itemAt(steps, n - 1, 'step').lengthMm, closedMm: b },
          ],
        };
      }
    }
  }
  const last = n - 1;
  return {
    corners,
    method: 'last-wall',
    changes:
      last >= 0
        ? [
            {
              wall: last,
              measuredMm: itemAt(steps, last, 'step').lengthMm,
              closedMm: distance(itemAt(corners, last, 'corner'), itemAt(corners, 0, 'corner')),
            },
          ]
        : [],
  };
}

/** Corners (plan mm) from typed corner coordinates; a repeated closing corner is dropped so wall i still runs corner i → i+1. */
export function outlineFromCorners(points: readonly Vec2[]): [number, number][] {
  const corners = points.map((p): [number, number] => [p[0], p[1]]);
  if (corners.length > 1 && distance(corners[0]!, corners[corners.length - 1]!) < POINT_TOLERANCE_MM) corners.pop();
  return corners;
}

/** The walk (lengths mm, turns degrees) that retraces a plan outline (mm), starting along wall 0. */
export function walkFromOutline(corners: readonly Vec2[]): { start: WalkStart; steps: WalkStep[] } {
  const n = corners.length;
  const steps: WalkStep[] = [];
  for (let i = 0; i < n; i++) {
    const here = sub(corners[(i + 1) % n]!, corners[i]!);
    const next = sub(corners[(i + 2) % n]!, corners[(i + 1) % n]!);
    const turn = normaliseAngleDeg(angleDegOf(next) - angleDegOf(here));
    steps.push({
      lengthMm: distance(corners[i]!, corners[(i + 1) % n]!),
      turnDeg: Math.abs(turn),
      turn: turn < 0 ? 'left' : 'right',
    });
  }
  const first = n > 1 ? sub(corners[1]!, corners[0]!) : ([1, 0] as const);
  return { start: { x: corners[0]?.[0] ?? 0, y: corners[0]?.[1] ?? 0, headingDeg: angleDegOf(first) }, steps };
}

/** Interior angle (degrees) at each corner of a plan outline (mm); above 180 at a re-entrant corner such as the inner corner of an L. */
export function interiorAnglesDeg(corners: readonly Vec2[]): number[] {
  const n = corners.length;
  const sign = windingSign(corners);
  return corners.map((corner, i) => {
    const incoming = sub(corner, corners[(i + n - 1) % n]!);
    const outgoing = sub(corners[(i + 1) % n]!, corner);
    const turn = normaliseAngleDeg(angleDegOf(outgoing) - angleDegOf(incoming));
    // Walking clockwise on the plan the room is on the right, so a right turn is a convex corner.
    return 180 - sign * turn;
  });
}
