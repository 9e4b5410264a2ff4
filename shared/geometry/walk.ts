// Walking through a room at eye level: what stops a person and where they may stand, as plain 2D
// geometry on the plan (mm, x right, y down). A person is a circle; walls are the inside faces of
// the outline, broken at doors and passages; pieces and open door leaves are rotated boxes.
import type { Piece } from '../schemas/option';
import type { RoomShell } from '../schemas/room';
import { doorSwing, placeOpening } from './openings';
import { blocksWalking, piecePlanBox } from './piece';
import { boundsMm, pointInPolygon } from './polygon';
import { DOOR_LEAF_THICKNESS_MM } from './scene';
import { layoutShellWalls } from './walls';
import { addScaled, directionDeg, dot, sub, type Vec2 } from './vec';
import { itemAt } from '../item-at';

/** How wide a person is taken to be, as a radius (mm): shoulders about half a metre across (common practice, no source). */
export const BODY_RADIUS_MM = 250;
/**
 * How far past a door's or passage's outer face a person may step (mm): enough to stand in the
 * doorway and look back into the room, not so far as to walk off into nothing.
 */
export const THRESHOLD_DEPTH_MM = 600;
/** Movement is checked in steps no longer than this share of the body radius, so nothing thin is walked through. */
const SUBSTEP_SHARE = 0.25;
/** Pushing out of several obstacles at once settles within a few rounds. */
const RESOLVE_ROUNDS = 4;
/** Below this (mm) two points are the same for the walk. */
const WALK_EPSILON_MM = 1e-6;
/** A body resting against a wall has exactly its radius of room; rounding must not pin it there (mm). */
const CONTACT_TOLERANCE_MM = 0.5;
/** A first standing place this far (mm) into the room from its door, beyond the body radius. */
const START_STEP_MM = 500;
/**
 * How far (mm) a first standing place keeps from an open door leaf, beyond the body radius: far
 * enough that the leaf is beside or behind the walker, not filling the first view.
 */
const START_LEAF_CLEARANCE_MM = 300;
/** How many places, half a step apart, are tried going into the room from a door. */
const START_TRIES = 8;
/** Where no door offers a free place, standing places are tried on a grid this fine (mm). */
const START_GRID_MM = 100;

/** Open door leaves are walk boxes whose id is this prefix and the door's id. */
const LEAF_ID_PREFIX = 'door:';

/** A thin wall face a person cannot cross, plan mm. */
export interface WalkSegment {
  a: Vec2;
  b: Vec2;
}

/** A rotated box a person cannot enter, plan mm: its centre, its own x axis (unit) and half sizes. */
export interface WalkBox {
  id: string;
  centre: Vec2;
  axisX: Vec2;
  halfXMm: number;
  halfYMm: number;
}

export interface WalkObstacles {
  segments: WalkSegment[];
  boxes: WalkBox[];
  /** The outline, for telling inside from outside. */
  outline: readonly Vec2[];
}

/**
 * What stops a person walking in a room (plan mm): each wall's inside face less its doors and
 * passages; round each of those a small threshold (the reveals carried on past the outer face and
 * closed there); open door leaves; and every placed piece a person has to go round (not a rug, not
 * hung above head height: blocksWalking in geometry/piece).
 */
export function walkObstacles(shell: RoomShell, pieces: readonly Piece[]): WalkObstacles {
  const walls = layoutShellWalls(shell);
  const segments: WalkSegment[] = [];
  const boxes: WalkBox[] = [];
  for (const wall of walls) {
    const gaps = shell.openings
      .filter((o) => o.wall === wall.index && o.type !== 'window')
      .map((o) => placeOpening(wall, o))
      .sort((p, q) => p.fromMm - q.fromMm);
    let along = 0;
    for (const gap of gaps) {
      if (gap.fromMm > along) segments.push({ a: addScaled(wall.start, wall.direction, along), b: gap.insideStart });
      along = Math.max(along, gap.toMm);
      const reach = wall.thicknessMm + THRESHOLD_DEPTH_MM;
      const farStart = addScaled(gap.insideStart, wall.outward, reach);
      const farEnd = addScaled(gap.insideEnd, wall.outward, reach);
      segments.push({ a: gap.insideStart, b: farStart }, { a: gap.insideEnd, b: farEnd }, { a: farStart, b: farEnd });
    }
    if (along < wall.lengthMm) segments.push({ a: addScaled(wall.start, wall.direction, along), b: wall.end });
  }
  for (const opening of shell.openings) {
    const wall = walls[opening.wall];
    if (!wall || opening.type !== 'door') continue;
    // The leaf stands open at DOOR_OPEN_ANGLE_DEG (openings.ts), as the 3D view and the plan draw it.
    const swing = doorSwing(wall, opening);
    const open = directionDeg(swing.openAngleDeg);
    const closed = directionDeg(swing.closedAngleDeg);
    const centre = addScaled(addScaled(swing.hingeMm, open, opening.width / 2), closed, DOOR_LEAF_THICKNESS_MM / 2);
    boxes.push({
      id: `${LEAF_ID_PREFIX}${opening.id}`,
      centre,
      axisX: open,
      halfXMm: opening.width / 2,
      halfYMm: DOOR_LEAF_THICKNESS_MM / 2,
    });
  }
  for (const piece of pieces) {
    if (!piece.placed || !blocksWalking(piece)) continue;
    const box = piecePlanBox(piece);
    boxes.push({ id: piece.id, centre: box.centre, axisX: box.axisX, halfXMm: box.halfWidthMm, halfYMm: box.halfDepthMm });
  }
  return { segments, boxes, outline: shell.outline };
}

function closestOnSegment(p: Vec2, s: WalkSegment): [number, number] {
  const ab = sub(s.b, s.a);
  const lengthSq = dot(ab, ab);
  const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, dot(sub(p, s.a), ab) / lengthSq));
  return addScaled(s.a, ab, t);
}

// A box's own axes: y is x turned 90° clockwise on the plan, as the scene builds pieces.
const axisYOf = (box: WalkBox): Vec2 => [-box.axisX[1], box.axisX[0]];

/**
 * Distance (mm) from plan point `p` to the nearest obstacle: to the nearest wall face or box edge,
 * zero or less inside a box (minus how deep).
 */
export function clearanceMm(obstacles: WalkObstacles, p: Vec2): number {
  let best = Infinity;
  for (const s of obstacles.segments) {
    const c = closestOnSegment(p, s);
    best = Math.min(best, Math.hypot(p[0] - c[0], p[1] - c[1]));
  }
  for (const box of obstacles.boxes) {
    const d = sub(p, box.centre);
    const lx = Math.abs(dot(d, box.axisX)) - box.halfXMm;
    const ly = Math.abs(dot(d, axisYOf(box))) - box.halfYMm;
    const outside = Math.hypot(Math.max(lx, 0), Math.max(ly, 0));
    best = Math.min(best, outside > 0 ? outside : Math.max(lx, ly));
  }
  return best;
}

// Moves p the least distance that leaves it at least `radius` from every obstacle it overlaps.
// `from` is where the body was before this step: a centre exactly on a face is pushed back to that side.
function resolve(obstacles: WalkObstacles, p: Vec2, from: Vec2, radius: number): [number, number] {
  let x = p[0];
  let y = p[1];
  for (let round = 0; round < RESOLVE_ROUNDS; round++) {
    let moved = false;
    for (const s of obstacles.segments) {
      const c = closestOnSegment([x, y], s);
      const dx = x - c[0];
      const dy = y - c[1];
      const d = Math.hypot(dx, dy);
      if (d >= radius) continue;
      let nx: number;
      let ny: number;
      if (d > WALK_EPSILON_MM) {
        nx = dx / d;
        ny = dy / d;
      } else {
        // On the face itself: back out towards the side the body came from.
        const ab = sub(s.b, s.a);
        const len = Math.hypot(ab[0], ab[1]) || 1;
        nx = -ab[1] / len;
        ny = ab[0] / len;
        if (nx * (from[0] - c[0]) + ny * (from[1] - c[1]) < 0) {
          nx = -nx;
          ny = -ny;
        }
      }
      x = c[0] + nx * radius;
      y = c[1] + ny * radius;
      moved = true;
    }
    for (const box of obstacles.boxes) {
      const ay = axisYOf(box);
      const d: Vec2 = [x - box.centre[0], y - box.centre[1]];
      const lx = dot(d, box.axisX);
      const ly = dot(d, ay);
      const qx = Math.min(box.halfXMm, Math.max(-box.halfXMm, lx));
      const qy = Math.min(box.halfYMm, Math.max(-box.halfYMm, ly));
      let ox = lx - qx;
      let oy = ly - qy;
      const out = Math.hypot(ox, oy);
      if (out >= radius) continue;
      if (out > WALK_EPSILON_MM) {
        ox = (ox / out) * radius;
        oy = (oy / out) * radius;
        ox += qx;
        oy += qy;
      } else {
        // Inside the box: out through the nearest side.
        const toX = box.halfXMm - Math.abs(lx);
        const toY = box.halfYMm - Math.abs(ly);
        if (toX < toY) {
          ox = Math.sign(lx || 1) * (box.halfXMm + radius);
          oy = ly;
        } else {
          ox = lx;
          oy = Math.sign(ly || 1) * (box.halfYMm + radius);
        }
      }
      x = box.centre[0] + box.axisX[0] * ox + ay[0] * oy;
      y = box.centre[1] + box.axisX[1] * ox + ay[1] * oy;
      moved = true;
    }
    if (!moved) break;
  }
  return [x, y];
}

/**
 * Where a body of `radiusMm` at `from` ends up after trying to move by `deltaMm` (plan mm): walls
 * and boxes stop it and it slides along them, as a person does along a wall.
 */
export function moveBody(obstacles: WalkObstacles, from: Vec2, deltaMm: Vec2, radiusMm = BODY_RADIUS_MM): [number, number] {
  const distance = Math.hypot(deltaMm[0], deltaMm[1]);
  const steps = Math.max(1, Math.ceil(distance / (radiusMm * SUBSTEP_SHARE)));
  let p: [number, number] = [from[0], from[1]];
  for (let i = 0; i < steps; i++) {
    const next: Vec2 = [p[0] + deltaMm[0] / steps, p[1] + deltaMm[1] / steps];
    p = resolve(obstacles, next, p, radiusMm);
  }
  return p;
}

/**
 * How far a body can walk in a straight line from `from` towards `to` (plan mm) before touching
 * anything: the last point on that line with room for it, never sliding sideways.
 */
export function walkLine(obstacles: WalkObstacles, from: Vec2, to: Vec2, radiusMm = BODY_RADIUS_MM): [number, number] {
  const d = sub(to, from);
  const distance = Math.hypot(d[0], d[1]);
  const steps = Math.max(1, Math.ceil(distance / (radiusMm * SUBSTEP_SHARE)));
  let reached: [number, number] = [from[0], from[1]];
  for (let i = 1; i <= steps; i++) {
    const p = addScaled(from, d, i / steps);
    if (clearanceMm(obstacles, p) < radiusMm - CONTACT_TOLERANCE_MM) break;
    reached = p;
  }
  return reached;
}

export interface WalkStart {
  /** Where the person stands, plan mm. */
  position: [number, number];
  /** Which way they face: plan degrees clockwise from +x. */
  headingDeg: number;
}

/** The middle of a floor by area (plan mm): where a person entering looks to take the room in. */
export function floorCentreMm(outline: readonly Vec2[]): [number, number] {
  let twiceArea = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0, j = outline.length - 1; i < outline.length; j = i++) {
    const c = outline[j]![0] * outline[i]![1] - outline[i]![0] * outline[j]![1];
    twiceArea += c;
    cx += (outline[j]![0] + outline[i]![0]) * c;
    cy += (outline[j]![1] + outline[i]![1]) * c;
  }
  if (twiceArea === 0) return [...itemAt(outline, 0, 'corner')];
  return [cx / (3 * twiceArea), cy / (3 * twiceArea)];
}

const headingDegOf = (v: Vec2) => (Math.atan2(v[1], v[0]) * 180) / Math.PI;

/** Distance (mm) from plan point `p` to the nearest open door leaf (Infinity without one). */
function leafDistanceMm(obstacles: WalkObstacles, p: Vec2): number {
  const leaves = obstacles.boxes.filter((b) => b.id.startsWith(LEAF_ID_PREFIX));
  return clearanceMm({ segments: [], boxes: leaves, outline: obstacles.outline }, p);
}

/**
 * Where a walk begins (plan mm): a step into the room from its first door (or passage), clear of
 * the open leaf (past its tip, so it stands beside or behind), facing the middle of the floor
 * (straight in when the middle is not in the room, as in a deep L); where the room is too shallow
 * for that, the first free place in from the door; without one, the freest place on the floor,
 * facing the middle.
 */
export function walkStart(shell: RoomShell, obstacles: WalkObstacles, radiusMm = BODY_RADIUS_MM): WalkStart {
  const centre = floorCentreMm(shell.outline);
  const centreInside = pointInPolygon(centre, shell.outline);
  const walls = layoutShellWalls(shell);
  const entries = [...shell.openings.filter((o) => o.type === 'door'), ...shell.openings.filter((o) => o.type === 'passage')];
  const free = (p: Vec2) => pointInPolygon(p, shell.outline) && clearanceMm(obstacles, p) >= radiusMm;
  const clearOfLeaf = (p: Vec2) => leafDistanceMm(obstacles, p) >= radiusMm + START_LEAF_CLEARANCE_MM;
  for (const wanted of [(p: Vec2) => free(p) && clearOfLeaf(p), free]) {
    for (const entry of entries) {
      const wall = walls[entry.wall];
      if (!wall) continue;
      const placement = placeOpening(wall, entry);
      const middle = addScaled(placement.insideStart, wall.direction, (placement.toMm - placement.fromMm) / 2);
      const inward: Vec2 = [-wall.outward[0], -wall.outward[1]];
      for (let extra = 0; extra < START_TRIES; extra++) {
        const p = addScaled(middle, inward, radiusMm + START_STEP_MM * (1 + extra / 2));
        if (!wanted(p)) continue;
        const look = sub(centre, p);
        const facesIn = dot(look, inward) > 0 && Math.hypot(look[0], look[1]) > START_STEP_MM;
        return { position: p, headingDeg: headingDegOf(centreInside && facesIn ? look : inward) };
      }
    }
  }
  const b = boundsMm(shell.outline);
  let best: { p: [number, number]; clear: number } = { p: [centre[0], centre[1]], clear: -Infinity };
  for (let x = b.minX + START_GRID_MM / 2; x < b.maxX; x += START_GRID_MM) {
    for (let y = b.minY + START_GRID_MM / 2; y < b.maxY; y += START_GRID_MM) {
      if (!pointInPolygon([x, y], shell.outline)) continue;
      const clear = clearanceMm(obstacles, [x, y]);
      if (clear > best.clear) best = { p: [x, y], clear };
    }
  }
  const look = sub(centre, best.p);
  const headingDeg = Math.hypot(look[0], look[1]) < START_GRID_MM ? 0 : headingDegOf(look);
  return { position: best.p, headingDeg };
}
