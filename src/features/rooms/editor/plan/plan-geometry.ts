// Pure helpers for the plan view: what to draw where, in plan mm (x right, y down, as in SVG).
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import { layoutShellWalls, outerRingMm, type WallLayout } from '../../../../../shared/geometry/walls';
import { placeShellOpenings } from '../../../../../shared/geometry/openings';
import { boundsMm, pointInPolygon, type Bounds2 } from '../../../../../shared/geometry/polygon';
import { boxesOverlap, boxInsideOutline, findPlacement, snapPieceToWalls } from '../../../../../shared/commands';
import { pieceFootprintMm } from '../../../../../shared/geometry/piece';
import type { ViewBox } from './plan-viewport';

/** Space round the room on the plan, for dimension lines and handles. */
export const PLAN_MARGIN_MM = 900;
/** Gap between the room and the holding area. */
export const HOLDING_GAP_MM = 800;
/** Space between pieces waiting in the holding area. */
export const HOLDING_SPACING_MM = 250;
/** Dimension lines sit this far outside the wall's outer face. */
export const DIMENSION_OFFSET_MM = 350;

export type Selection = { kind: 'piece'; id: string } | { kind: 'opening'; id: string } | { kind: 'wall'; index: number } | null;

/**
 * What the plan marks for a fit check finding: the pieces it names, for a narrow walkway the gap, and
 * for a door or drawer that cannot open the floor it opens into (a plan polygon, mm).
 */
export interface Highlight {
  pieceIds: string[];
  gap?: { a: [number, number]; b: [number, number]; label: string };
  zone?: [number, number][];
}

export interface PlanLayout {
  walls: WallLayout[];
  outer: [number, number][];
  roomBounds: Bounds2;
  openings: ReturnType<typeof placeShellOpenings>;
  holding: { x: number; y: number; width: number; height: number; slots: Record<string, [number, number]>; side: HoldingSide };
  viewBox: ViewBox;
  /** What the plan must show: the room and the holding area with their dimension lines (for fitViewBox). */
  content: ViewBox;
}

/** Where the holding area sits: beside the room in a wide panel, below it in a tall one. */
export type HoldingSide = 'right' | 'below';
/** Below the room the gap also holds the bottom dimension line and the area's label. */
const HOLDING_GAP_BELOW_MM = 1300;

/** Walls, openings, the holding area's slots and the view box for a shell and its option's pieces. */
export function planLayout(shell: RoomShell, pieces: readonly Piece[], side: HoldingSide = 'right'): PlanLayout {
  const walls = layoutShellWalls(shell);
  const outer = outerRingMm(walls);
  const roomBounds = boundsMm(outer);
  const held = pieces.filter((p) => !p.placed);
  const slots: Record<string, [number, number]> = {};
  let x: number;
  let top: number;
  let holdingWidth: number;
  let holdingHeight: number;
  if (side === 'below') {
    x = roomBounds.minX;
    top = roomBounds.maxY + HOLDING_GAP_BELOW_MM;
    holdingHeight = Math.max(1600, ...held.map((p) => Math.max(p.width, p.depth) + 2 * HOLDING_SPACING_MM));
    let along = x + HOLDING_SPACING_MM;
    for (const p of held) {
      slots[p.id] = [along + p.width / 2, top + holdingHeight / 2];
      along += p.width + HOLDING_SPACING_MM;
    }
    holdingWidth = Math.max(roomBounds.maxX - roomBounds.minX, along - x);
  } else {
    holdingWidth = Math.max(1600, ...held.map((p) => Math.max(p.width, p.depth) + 2 * HOLDING_SPACING_MM));
    x = roomBounds.maxX + HOLDING_GAP_MM;
    top = roomBounds.minY;
    let y = roomBounds.minY + HOLDING_SPACING_MM;
    for (const p of held) {
      slots[p.id] = [x + holdingWidth / 2, y + p.depth / 2];
      y += p.depth + HOLDING_SPACING_MM;
    }
    holdingHeight = Math.max(roomBounds.maxY - roomBounds.minY, y - roomBounds.minY);
  }
  const right = Math.max(roomBounds.maxX, x + holdingWidth);
  const bottom = Math.max(roomBounds.maxY, top + holdingHeight);
  const viewBox = {
    x: roomBounds.minX - PLAN_MARGIN_MM,
    y: roomBounds.minY - PLAN_MARGIN_MM,
    w: right - roomBounds.minX + 2 * PLAN_MARGIN_MM,
    h: bottom - roomBounds.minY + 2 * PLAN_MARGIN_MM,
  };
  const content = {
    x: roomBounds.minX - DIMENSION_OFFSET_MM,
    y: roomBounds.minY - DIMENSION_OFFSET_MM,
    w: right - roomBounds.minX + 2 * DIMENSION_OFFSET_MM,
    h: bottom - roomBounds.minY + 2 * DIMENSION_OFFSET_MM,
  };
  return {
    walls,
    outer,
    roomBounds,
    openings: placeShellOpenings(shell),
    holding: { x, y: top, width: holdingWidth, height: holdingHeight, slots, side },
    viewBox,
    content,
  };
}

/** SVG path data of a closed ring. */
export function ringPath(points: readonly (readonly [number, number])[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${p[0]} ${p[1]}`).join(' ') + ' Z';
}

/** The four corners of a piece's box on the plan. */
export function pieceRing(piece: Pick<Piece, 'x' | 'y' | 'width' | 'depth' | 'rotation'>): [number, number][] {
  return pieceFootprintMm(piece).map((p) => [p[0], p[1]] as [number, number]);
}

/** Whether a plan point is inside the holding area. */
export function inHolding(layout: PlanLayout, point: readonly [number, number]): boolean {
  const h = layout.holding;
  if (h.side === 'below')
    return point[1] >= h.y - HOLDING_GAP_MM / 2 && point[0] >= h.x - PLAN_MARGIN_MM && point[0] <= h.x + h.width + PLAN_MARGIN_MM;
  return point[0] >= h.x - HOLDING_GAP_MM / 2 && point[1] >= h.y - PLAN_MARGIN_MM && point[1] <= h.y + h.height + PLAN_MARGIN_MM;
}

/**
 * The piece moved to free floor inside the outline nearest to `near` (plan mm), snapped to a wall
 * when the snap keeps it on free floor. Its turn and size stay as they are.
 */
export function placedNear<P extends Piece>(
  shell: RoomShell,
  pieces: readonly Piece[],
  piece: P,
  near: readonly [number, number],
): P {
  const request = { id: piece.id, width: piece.width, depth: piece.depth, rotation: piece.rotation };
  const [x, y] = findPlacement(shell, pieces, { ...request, near });
  const at = { ...piece, x, y, placed: true };
  const snapped = snapPieceToWalls(at, shell).piece;
  // A snapped piece touches its wall, so it is tested a hair smaller than it is.
  const fit = pieceFootprintMm({ ...snapped, width: snapped.width - 2, depth: snapped.depth - 2 });
  const free =
    boxInsideOutline(shell.outline, fit) &&
    pieces.every((p) => !p.placed || p.id === piece.id || !boxesOverlap(fit, pieceFootprintMm(p)));
  return free ? snapped : at;
}

/** The centre of a room's outline bounds, where a new piece lands. */
export function roomCentre(shell: RoomShell): [number, number] {
  const b = boundsMm(shell.outline);
  const centre: [number, number] = [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2];
  if (pointInPolygon(centre, shell.outline)) return centre;
  // An L or U whose box centre falls outside: use the first corner's inside neighbourhood instead.
  const [x0, y0] = shell.outline[0];
  const [x1, y1] = shell.outline[1];
  const [x2, y2] = shell.outline[shell.outline.length - 1];
  return [(x0 + x1 + x2) / 3, (y0 + y1 + y2) / 3];
}

/** The point a share `t` of the way from a to b. */
export function mid(a: readonly [number, number], b: readonly [number, number], t: number): [number, number] {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}
