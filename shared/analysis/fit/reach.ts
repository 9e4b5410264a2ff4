// Where a person stands to use each piece and how much clear floor they need there, from the piece's
// kind (clearances.ts holds the figures and their sources), or from its shape for a piece with no
// kind; and whether the routes the walkway check found meet those needs.
import { dot, sub, type Vec2 } from '../../geometry/vec';
import { TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import { LOW_TABLE_MAX_HEIGHT_MM, reachWidthMm, SEAT_KINDS, SEAT_TO_TABLE_MAX_MM, USED_FROM_SEAT_KINDS } from './clearances';
import { roundToCmMm } from './messages';

/** A side of a piece's box, in its own axes: front +y, back −y, right +x, left −x. */
export type Face = 'front' | 'back' | 'left' | 'right';

/** One place to reach a piece from: the floor before one of its faces, and the clear width a route there needs (mm). */
export interface ReachWay {
  face: Face;
  requiredMm: number;
}

/** A need is met when any one of its ways is; a piece is reached when every one of its needs is met. */
export type ReachNeed = readonly ReachWay[];

/** A face as plan vectors: a unit vector along it, one out of the box, and the half length along and half depth out (mm). */
export interface FaceFrame {
  along: [number, number];
  out: [number, number];
  halfAlongMm: number;
  halfOutMm: number;
}

/** The plan frame of one face of a box. */
export function faceFrame(box: PieceBox, face: Face): FaceFrame {
  const { axisX: x, axisY: y, halfWidthMm: hw, halfDepthMm: hd } = box;
  switch (face) {
    case 'front':
      return { along: x, out: y, halfAlongMm: hw, halfOutMm: hd };
    case 'back':
      return { along: x, out: [-y[0], -y[1]], halfAlongMm: hw, halfOutMm: hd };
    case 'right':
      return { along: y, out: x, halfAlongMm: hd, halfOutMm: hw };
    case 'left':
      return { along: y, out: [-x[0], -x[1]], halfAlongMm: hd, halfOutMm: hw };
  }
}

/** Where points lie in a box's face frame: along the face and out from it (mm, 0 at the face). */
function spanIn(box: PieceBox, frame: FaceFrame, points: readonly Vec2[]) {
  let minAlong = Infinity;
  let maxAlong = -Infinity;
  let minOut = Infinity;
  for (const p of points) {
    const d = sub(p, box.centre);
    const along = dot(d, frame.along);
    minAlong = Math.min(minAlong, along);
    maxAlong = Math.max(maxAlong, along);
    minOut = Math.min(minOut, dot(d, frame.out) - frame.halfOutMm);
  }
  return { minAlong, maxAlong, minOut };
}

/** Whether the box is low enough to be a low table and of a kind (or no kind) used from a seat. */
function isLowTable(box: PieceBox): boolean {
  return USED_FROM_SEAT_KINDS.includes(box.piece.kind ?? 'plain-block') && box.topMm <= LOW_TABLE_MAX_HEIGHT_MM;
}

/**
 * The seat a low table stands before, if any: a seat whose front faces the table across at most
 * SEAT_TO_TABLE_MAX_MM, the table's span along the seat's front overlapping the seat's own.
 */
export function seatBefore(table: PieceBox, boxes: readonly PieceBox[]): PieceBox | undefined {
  if (!isLowTable(table)) return undefined;
  return boxes.find((seat) => {
    if (seat === table || !SEAT_KINDS.includes(seat.piece.kind ?? 'plain-block')) return false;
    const frame = faceFrame(seat, 'front');
    const span = spanIn(seat, frame, table.corners);
    const overlapMm = Math.min(span.maxAlong, frame.halfAlongMm) - Math.max(span.minAlong, -frame.halfAlongMm);
    return overlapMm > TOUCH_TOLERANCE_MM && span.minOut >= -TOUCH_TOLERANCE_MM && span.minOut <= SEAT_TO_TABLE_MAX_MM;
  });
}

/**
 * What a placed piece needs to be reached, given the others (plan mm) and the walkway width: its
 * front at the width its kind asks (clearances.ts); nothing for a low table before a seat, which is
 * used from the seat.
 */
export function reachNeeds(box: PieceBox, boxes: readonly PieceBox[], walkwayMm: number): ReachNeed[] {
  if (seatBefore(box, boxes)) return [];
  return [[{ face: 'front', requiredMm: reachWidthMm(box.piece, walkwayMm) }]];
}

/** The way nearest to being met on a need no way meets: its best floor cell, that cell's bottleneck and the width the way asks (mm). */
export interface ShortWay {
  cell: number;
  bottleneckMm: number;
  requiredMm: number;
}

/** The cell with the widest route to it, and that route's bottleneck (mm, −1 when none reaches). */
function bestCell(cells: readonly number[], bottleneckMm: Int32Array): { cell: number; reachedMm: number } {
  let cell = -1;
  let reachedMm = -1;
  for (const c of cells) {
    if (bottleneckMm[c]! > reachedMm) {
      reachedMm = bottleneckMm[c]!;
      cell = c;
    }
  }
  return { cell, reachedMm };
}

/**
 * Whether a piece's needs are met by the routes found (bottleneckMm: each floor cell's best route
 * width, −1 where none reaches): `reached`; `unreachable` when some need has no way whose patch of
 * floor (cellsOf) has at least minCells free cells and one a route reaches; or else the first need
 * left unmet, by the way that comes nearest to the width it asks. A way's bottleneck is that of its
 * best cell, rounded to the centimetre as findings report it.
 */
export function judgeReach(
  needs: readonly ReachNeed[],
  cellsOf: (way: ReachWay) => readonly number[],
  bottleneckMm: Int32Array,
  minCells: number,
): 'reached' | 'unreachable' | ShortWay {
  for (const need of needs) {
    let nearest: ShortWay | null = null;
    let met = false;
    for (const way of need) {
      const cells = cellsOf(way);
      const best = bestCell(cells, bottleneckMm);
      if (cells.length < minCells || best.reachedMm < 0) continue;
      if (roundToCmMm(best.reachedMm) >= way.requiredMm) {
        met = true;
        break;
      }
      if (!nearest || best.reachedMm - way.requiredMm > nearest.bottleneckMm - nearest.requiredMm)
        nearest = { cell: best.cell, bottleneckMm: best.reachedMm, requiredMm: way.requiredMm };
    }
    if (!met) return nearest ?? 'unreachable';
  }
  return 'reached';
}
