// Fit check rule `cannot-open`: a piece's own doors and drawers, as its form draws them, need clear
// floor in front to open; another piece, a wall or a room door's swing standing there is reported
// with the clear depth measured, the depth needed and the zone the front opens into. Plan mm.
import { formParts, type Part } from '../../geometry/forms';
import { isWalkedOver } from '../../geometry/piece';
import { addScaled, dot, sub, type Vec2 } from '../../geometry/vec';
import type { PieceKind } from '../../schemas/piece-kind';
import type { RoomShell } from '../../schemas/room';
import { convexOverlap, TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import { inwardSwings } from './door-swing';
import type { Finding } from './finding';
import { capitalise, cmText, roundToCmMm, theName } from './messages';

/**
 * How much shorter (mm) a drawer runs than the piece is deep: the carcass back board (18 mm, the
 * board the forms draw) and the space left behind the runners, about 50 mm together (common
 * practice). A drawer pulled out to its stop needs its own length, the piece's depth less this, clear
 * in front.
 */
export const DRAWER_BACK_MM = 50;

/**
 * Kinds whose fronts open: doors swing out by a leaf's width (a hinged leaf's own width, common
 * practice; REFERENCES: wardrobe leaf 400–600 mm needs its own width clear), drawers pull out by
 * their length, and an oven's or a dishwasher's door drops down by its own height (common practice).
 */
export const OPENING_KINDS: ReadonlySet<PieceKind> = new Set<PieceKind>([
  'wardrobe',
  'chest-of-drawers',
  'sideboard',
  'media-unit',
  'bedside-table',
  'wall-cabinet',
  'kitchen-base-unit',
  'kitchen-wall-unit',
  'oven-housing',
  'dishwasher',
]);

/** Light seats pulled aside by hand before a drawer or door is opened: they never block one (common practice). */
const MOVED_ASIDE: ReadonlySet<PieceKind> = new Set<PieceKind>(['dining-chair', 'stool']);

/** Kinds whose front doors hinge at the bottom and drop down. */
const DROP_DOWN: ReadonlySet<PieceKind> = new Set<PieceKind>(['oven-housing', 'dishwasher']);

/** Points along a door's quarter arc: 16 straight pieces fall short of the arc by under 0.5 % of the leaf. */
const ARC_SEGMENTS = 16;

/** How a front opens: a side-hinged door, a drawer, or a door hinged at its foot. */
export type FrontMotion = 'door' | 'drawer' | 'drop-down';

/** One front of a piece, in the piece's frame (mm): x across its width, z up from its underside. */
export interface Front {
  motion: FrontMotion;
  x0: number;
  x1: number;
  z0: number;
  z1: number;
  /** A door's hinge side, seen from the front: at x0 (left) or at x1 (right). */
  hinge: 'left' | 'right';
  /** Clear depth (mm) in front of the piece the front needs to open fully. */
  requiredMm: number;
}

function isHandle(part: Part): boolean {
  return part.role === 'front' && part.shape === 'box' && part.slot === 'accent';
}

/**
 * The fronts a piece's form draws and how each opens: every front panel with a handle on it. An
 * upright handle marks a door, hinged on the side away from it; a level one a drawer, or on an oven
 * or a dishwasher the door that drops down. Panels without a handle (a control strip) do not open.
 */
export function pieceFronts(piece: PieceBox['piece']): Front[] {
  if (!piece.kind || !OPENING_KINDS.has(piece.kind)) return [];
  const parts = formParts(piece.kind, piece.settings, piece);
  const handles = parts.filter(isHandle);
  const fronts: Front[] = [];
  for (const panel of parts) {
    if (panel.role !== 'front' || panel.shape !== 'panel') continue;
    const x0 = panel.x - panel.w / 2;
    const x1 = panel.x + panel.w / 2;
    const z0 = panel.z;
    const z1 = panel.z + panel.h;
    const handle = handles.find((h) => h.x >= x0 && h.x <= x1 && h.z + h.h / 2 >= z0 && h.z + h.h / 2 <= z1);
    if (!handle) continue;
    const upright = handle.h > handle.w;
    // An appliance's door is drawn in its own colour (glass, steel); its drawers in the piece's finish.
    const appliance = DROP_DOWN.has(piece.kind) && panel.slot === 'own';
    const motion: FrontMotion = upright ? 'door' : appliance ? 'drop-down' : 'drawer';
    const requiredMm = motion === 'door' ? panel.w : motion === 'drop-down' ? panel.h : piece.depth - DRAWER_BACK_MM;
    fronts.push({ motion, x0, x1, z0, z1, hinge: handle.x > panel.x ? 'left' : 'right', requiredMm });
  }
  return fronts;
}

/** The floor a front opens into, in the piece's frame (mm): a door's quarter disc (hinge, then the arc), else a rectangle. */
export function frontZoneLocal(front: Front, frontY: number): [number, number][] {
  if (front.motion !== 'door') {
    const far = frontY + front.requiredMm;
    return [
      [front.x0, frontY],
      [front.x1, frontY],
      [front.x1, far],
      [front.x0, far],
    ];
  }
  const hingeX = front.hinge === 'left' ? front.x0 : front.x1;
  const across = front.hinge === 'left' ? 1 : -1;
  const zone: [number, number][] = [[hingeX, frontY]];
  for (let k = 0; k <= ARC_SEGMENTS; k++) {
    const angle = ((Math.PI / 2) * k) / ARC_SEGMENTS;
    zone.push([hingeX + across * front.requiredMm * Math.cos(angle), frontY + front.requiredMm * Math.sin(angle)]);
  }
  return zone;
}

function toPlan(box: PieceBox, [u, v]: Vec2): [number, number] {
  return addScaled(addScaled(box.centre, box.axisX, u), box.axisY, v);
}

function toLocal(box: PieceBox, p: Vec2): [number, number] {
  const offset = sub(p, box.centre);
  return [dot(offset, box.axisX), dot(offset, box.axisY)];
}

/** The part of a polygon (or a segment, as two points) with x0 ≤ u ≤ x1, clipped edge by edge. */
function clipToStrip(points: readonly Vec2[], x0: number, x1: number): Vec2[] {
  let shape: Vec2[] = [...points];
  for (const [edge, keep] of [
    [x0, (u: number) => u >= x0],
    [x1, (u: number) => u <= x1],
  ] as const) {
    const kept: Vec2[] = [];
    for (let i = 0; i < shape.length; i++) {
      const a = shape[i]!;
      const b = shape[(i + 1) % shape.length]!;
      if (keep(a[0])) kept.push(a);
      if (keep(a[0]) !== keep(b[0])) {
        const t = (edge - a[0]) / (b[0] - a[0]);
        kept.push([edge, a[1] + (b[1] - a[1]) * t]);
      }
    }
    shape = kept;
  }
  return shape;
}

/** Clear depth (mm) from the piece's front to a shape (plan mm), straight out across the front's width. */
function clearDepthMm(box: PieceBox, front: Front, frontY: number, shape: readonly Vec2[]): number {
  const clipped = clipToStrip(
    shape.map((p) => toLocal(box, p)),
    front.x0,
    front.x1,
  );
  let nearest = Infinity;
  for (const [, v] of clipped) nearest = Math.min(nearest, v);
  return Math.max(0, nearest - frontY);
}

/** Something standing where a front opens: its plan shape, whether it is a segment (a wall), and who it is. */
interface Obstacle {
  shape: readonly Vec2[];
  segment: boolean;
  bottomMm: number;
  topMm: number;
  words: string;
  pieceId?: string;
  openingId?: string;
}

function roomObstacles(shell: RoomShell, boxes: readonly PieceBox[]): Obstacle[] {
  const obstacles: Obstacle[] = [];
  for (const box of boxes) {
    if (isWalkedOver(box.piece) || (box.piece.kind && MOVED_ASIDE.has(box.piece.kind))) continue;
    obstacles.push({
      shape: box.corners,
      segment: false,
      bottomMm: box.bottomMm,
      topMm: box.topMm,
      words: theName(box.piece),
      pieceId: box.piece.id,
    });
  }
  const { outline } = shell;
  outline.forEach((corner, i) => {
    const next = outline[(i + 1) % outline.length]!;
    obstacles.push({ shape: [corner, next], segment: true, bottomMm: 0, topMm: Infinity, words: 'the wall' });
  });
  for (const { door, sector } of inwardSwings(shell)) {
    obstacles.push({
      shape: sector,
      segment: false,
      bottomMm: 0,
      topMm: door.height,
      words: 'the door’s swing',
      openingId: door.id,
    });
  }
  return obstacles;
}

/**
 * Whether segment ab runs through a convex polygon (plan mm): the polygon reaches past the
 * segment's line on both sides by more than a touch, and the part of the segment inside the polygon
 * (clipped edge by edge) is longer than a touch. A wall along the zone's edge only touches it.
 */
export function segmentEntersConvex(a: Vec2, b: Vec2, polygon: readonly Vec2[]): boolean {
  const along = sub(b, a);
  const lengthMm = Math.hypot(along[0], along[1]);
  if (lengthMm === 0) return false;
  const normal: Vec2 = [-along[1] / lengthMm, along[0] / lengthMm];
  const line = dot(a, normal);
  const sides = polygon.map((p) => dot(p, normal) - line);
  if (Math.min(...sides) > -TOUCH_TOLERANCE_MM || Math.max(...sides) < TOUCH_TOLERANCE_MM) return false;
  let inside: Vec2 = [0, 0];
  for (const p of polygon) inside = addScaled(inside, p, 1 / polygon.length);
  let from = 0;
  let to = 1;
  for (let i = 0; i < polygon.length && from < to; i++) {
    const p = polygon[i]!;
    const edge = sub(polygon[(i + 1) % polygon.length]!, p);
    if (edge[0] === 0 && edge[1] === 0) continue;
    let inward: Vec2 = [-edge[1], edge[0]];
    if (dot(inward, sub(inside, p)) < 0) inward = [edge[1], -edge[0]];
    // a + t·along stays on the inner side of this edge where start + t·rate ≥ 0.
    const start = dot(inward, sub(a, p));
    const rate = dot(inward, along);
    if (rate === 0) {
      if (start < 0) return false;
    } else if (rate > 0) from = Math.max(from, -start / rate);
    else to = Math.min(to, -start / rate);
  }
  return (to - from) * lengthMm > TOUCH_TOLERANCE_MM;
}

function blocks(obstacle: Obstacle, zone: readonly Vec2[]): boolean {
  return obstacle.segment
    ? segmentEntersConvex(obstacle.shape[0]!, obstacle.shape[1]!, zone)
    : convexOverlap(obstacle.shape, zone);
}

const FRONT_WORDS: Record<FrontMotion, [one: string, many: string, verb: string]> = {
  door: ['door', 'doors', 'open'],
  drawer: ['drawer', 'drawers', 'pull out'],
  'drop-down': ['door', 'doors', 'open'],
};

/** The worst blocked front of one piece: how deep it is clear, what it needs, its zone and what stands there. */
interface Blocked {
  front: Front;
  measuredMm: number;
  zone: [number, number][];
  by: Obstacle;
}

/**
 * `cannot-open`: placed pieces (plan mm) of a kind with doors or drawers (OPENING_KINDS) where
 * another piece, a wall or a door's swing stands in the floor a front opens into, at the height of
 * that front. Rugs, light chairs and stools are left out. One finding per piece, for the front
 * short of the most depth.
 */
export function findCannotOpen(shell: RoomShell, boxes: readonly PieceBox[]): Finding[] {
  const openers = boxes.filter((box) => box.piece.kind && OPENING_KINDS.has(box.piece.kind));
  if (openers.length === 0) return [];
  const obstacles = roomObstacles(shell, boxes);
  const findings: Finding[] = [];
  for (const box of openers) {
    const { piece } = box;
    const frontY = box.halfDepthMm;
    let worst: Blocked | null = null;
    const blockedByMotion = new Map<FrontMotion, number>();
    for (const front of pieceFronts(piece)) {
      const zone = frontZoneLocal(front, frontY).map((p) => toPlan(box, p));
      const bottomMm = piece.elevation + front.z0;
      const topMm = piece.elevation + front.z1;
      let measuredMm = Infinity;
      let by: Obstacle | null = null;
      for (const obstacle of obstacles) {
        if (obstacle.pieceId === piece.id) continue;
        if (obstacle.topMm <= bottomMm + TOUCH_TOLERANCE_MM || obstacle.bottomMm >= topMm - TOUCH_TOLERANCE_MM) continue;
        if (!blocks(obstacle, zone)) continue;
        const depthMm = clearDepthMm(box, front, frontY, obstacle.shape);
        if (depthMm < measuredMm) {
          measuredMm = depthMm;
          by = obstacle;
        }
      }
      if (!by) continue;
      blockedByMotion.set(front.motion, (blockedByMotion.get(front.motion) ?? 0) + 1);
      const shortMm = front.requiredMm - measuredMm;
      if (!worst || shortMm > worst.front.requiredMm - worst.measuredMm)
        worst = { front, measuredMm: Math.min(measuredMm, front.requiredMm), zone, by };
    }
    if (!worst) continue;
    const [one, many, verb] = FRONT_WORDS[worst.front.motion];
    const measuredMm = roundToCmMm(worst.measuredMm);
    const fronts = (blockedByMotion.get(worst.front.motion) ?? 0) > 1 ? many : one;
    findings.push({
      kind: 'cannot-open',
      pieces: [piece.id, ...(worst.by.pieceId ? [worst.by.pieceId] : [])],
      openings: worst.by.openingId ? [worst.by.openingId] : [],
      message: capitalise(
        `${theName(piece)}’s ${fronts} cannot ${verb} fully: ${cmText(measuredMm)} clear in front, blocked by ${worst.by.words}`,
      ),
      measuredMm,
      requiredMm: roundToCmMm(worst.front.requiredMm),
      zone: worst.zone.map(([x, y]) => [Math.round(x), Math.round(y)]),
    });
  }
  return findings;
}
