// Where a person stands to use each piece and how much clear floor they need there, from the piece's
// kind (clearances.ts holds the figures and their sources), or from its shape for a piece with no
// kind; and whether the routes the walkway check found meet those needs.
import { boxCornersMm, planBoxAt } from '../../geometry/piece';
import { addScaled, dot, sub, type Vec2 } from '../../geometry/vec';
import { standingOn, TOUCH_TOLERANCE_MM, type PieceBox } from './boxes';
import {
  ANY_SIDE_KINDS,
  BED_LEAST_USED_SIDE_MM,
  DOUBLE_BED_MIN_WIDTH_MM,
  LOW_TABLE_MAX_HEIGHT_MM,
  PERSON_WIDTH_MM,
  reachWidthMm,
  SEAT_KINDS,
  SEAT_TO_TABLE_MAX_MM,
  USED_FROM_SEAT_KINDS,
} from './clearances';
import { capitalise, roundToCmMm, theName } from './messages';

/** A side of a piece's box, in its own axes: front +y, back −y, right +x, left −x. */
export type Face = 'front' | 'back' | 'left' | 'right';

/** One place to reach a piece from: the floor before one of its faces, and the clear width a route there needs (mm). */
export interface ReachWay {
  face: Face;
  /** The box whose face it is, when not the piece's own (a seat reached round the low table before it). */
  box?: PieceBox;
  requiredMm: number;
  /** How wide (mm) a stretch of the patch along the face a route reaches must be; 0 when a few cells will do. */
  stretchMm: number;
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

/** The low table standing before a seat, if any (seatBefore the other way round). */
export function tableBefore(seat: PieceBox, boxes: readonly PieceBox[]): PieceBox | undefined {
  if (!SEAT_KINDS.includes(seat.piece.kind ?? 'plain-block')) return undefined;
  return boxes.find((table) => table !== seat && seatBefore(table, [seat]) === seat);
}

/**
 * The floor between a seat and the low table before it, as a box (plan mm) standing for the seat:
 * the two are one layout, so the gap is neither a walkway nor where the seat is reached from.
 */
export function gapBetween(seat: PieceBox, table: PieceBox): PieceBox {
  const frame = faceFrame(seat, 'front');
  const span = spanIn(seat, frame, table.corners);
  const fromMm = Math.max(span.minAlong, -frame.halfAlongMm);
  const toMm = Math.min(span.maxAlong, frame.halfAlongMm);
  const depthMm = Math.max(0, span.minOut);
  const centre = addScaled(addScaled(seat.centre, frame.along, (fromMm + toMm) / 2), frame.out, frame.halfOutMm + depthMm / 2);
  const plan = planBoxAt(centre, seat.axisX, toMm - fromMm, depthMm);
  return { piece: seat.piece, ...plan, corners: boxCornersMm(plan), bottomMm: seat.bottomMm, topMm: seat.topMm };
}

/**
 * The obstacles the walkway check draws on the floor: every one, then the floor between each seat
 * and the low table before it, filled (gapBetween); `owner` gives, for each, the index of the
 * obstacle it stands for (a filled gap, its seat's).
 */
export function withSeatGaps(obstacles: readonly PieceBox[]): { filled: PieceBox[]; owner: number[] } {
  const filled = [...obstacles];
  const owner = obstacles.map((_, index) => index);
  obstacles.forEach((seat, index) => {
    const table = tableBefore(seat, obstacles);
    if (!table) return;
    filled.push(gapBetween(seat, table));
    owner.push(index);
  });
  return { filled, owner };
}

const FACES: readonly Face[] = ['front', 'back', 'left', 'right'];

/** The face of a box that looks most nearly along a plan direction. */
function faceTowards(box: PieceBox, direction: Vec2): Face {
  return FACES.reduce((a, b) => (dot(faceFrame(box, b).out, direction) > dot(faceFrame(box, a).out, direction) ? b : a));
}

/**
 * What a placed piece needs to be reached, given the others (plan mm) and the walkway width, at the
 * width its kind asks (clearances.ts): tables, desks and ottomans from any side; a seat from a
 * stretch of its front at least PERSON_WIDTH_MM wide, or round the low table before it (any side of
 * the table but the one facing the seat); a bed from either long side, and a double from both, the
 * second at BED_LEAST_USED_SIDE_MM; every other piece from its front. A low table before a seat
 * needs nothing: it is used from the seat; nor does a piece standing on another (a lamp on a
 * table): it is used where the piece below it is, whose own needs count.
 */
export function reachNeeds(box: PieceBox, boxes: readonly PieceBox[], walkwayMm: number): ReachNeed[] {
  if (seatBefore(box, boxes) || standingOn(box, boxes)) return [];
  const requiredMm = reachWidthMm(box.piece, walkwayMm);
  const kind = box.piece.kind ?? 'plain-block';
  if (ANY_SIDE_KINDS.includes(kind)) return [FACES.map((face) => ({ face, requiredMm, stretchMm: 0 }))];
  if (kind === 'bed') return bedNeeds(box, requiredMm, walkwayMm);
  if (!SEAT_KINDS.includes(kind)) return [[{ face: 'front', requiredMm, stretchMm: 0 }]];
  const front: ReachWay = { face: 'front', requiredMm, stretchMm: PERSON_WIDTH_MM };
  const table = tableBefore(box, boxes);
  if (!table) return [[front]];
  const facing = faceTowards(table, faceFrame(box, 'front').out.map((v) => -v) as [number, number]);
  return [[front, ...FACES.filter((f) => f !== facing).map((face) => ({ face, box: table, requiredMm, stretchMm: 0 }))]];
}

const LONG_SIDES: readonly Face[] = ['left', 'right'];

/**
 * A bed's needs: one long side (left or right, head to foot) at `usedMm`; a double (at least
 * DOUBLE_BED_MIN_WIDTH_MM wide) also each long side at BED_LEAST_USED_SIDE_MM, so one side at the
 * full width and the other at the least-used width. The foot does not count.
 */
function bedNeeds(box: PieceBox, usedMm: number, walkwayMm: number): ReachNeed[] {
  const needs: ReachNeed[] = [LONG_SIDES.map((face) => ({ face, requiredMm: usedMm, stretchMm: 0 }))];
  if (2 * box.halfWidthMm < DOUBLE_BED_MIN_WIDTH_MM - TOUCH_TOLERANCE_MM) return needs;
  const leastMm = Math.min(walkwayMm, BED_LEAST_USED_SIDE_MM);
  for (const face of LONG_SIDES) needs.push([{ face, requiredMm: leastMm, stretchMm: 0 }]);
  return needs;
}

/** The sentence for a piece no route reaches, by the need left unmet: its front, one side of a double bed, or the piece itself. */
export function unreachableMessage(piece: PieceBox['piece'], need: ReachNeed): string {
  if (need.every((way) => way.face === 'front' && !way.box))
    return `The front of ${theName(piece)} cannot be reached from any door`;
  if (need.length === 1) return `One long side of ${theName(piece)} cannot be reached from any door; a bed this wide needs both`;
  return `${capitalise(theName(piece))} cannot be reached from any door`;
}

/** A patch of floor before a face: its free cells and where each lies along the face (mm from its middle). */
export interface Patch {
  /** The face's length (mm). */
  faceMm: number;
  cells: number[];
  alongMm: number[];
}

/** The way nearest to being met on a need no way meets: its best floor cell, that cell's bottleneck and the width the way asks (mm). */
export interface ShortWay {
  cell: number;
  bottleneckMm: number;
  requiredMm: number;
}

/**
 * The widest route that joins a stretch of a patch at least stretchMm wide along its face: the patch
 * is cut into strips a cell wide across the face; a stretch is a run of strips each with a free cell
 * some route reaches, and it is as good as the widest route to any of its cells (a person walks in
 * there and along it). A face narrower than the stretch needs all of its length. The cell given is
 * where that route ends.
 */
function bestStretch(patch: Patch, bottleneckMm: Int32Array, stretchMm: number, cellMm: number) {
  const stripMm = new Map<number, number>();
  const stripCell = new Map<number, number>();
  patch.cells.forEach((cell, k) => {
    const reached = bottleneckMm[cell]!;
    if (reached < 0) return;
    const strip = Math.floor((patch.alongMm[k]! + patch.faceMm / 2) / cellMm);
    if (reached > (stripMm.get(strip) ?? -1)) {
      stripMm.set(strip, reached);
      stripCell.set(strip, cell);
    }
  });
  // A run of n strips spans n cells along the face.
  const span = Math.ceil(Math.min(stretchMm, patch.faceMm - cellMm) / cellMm);
  let best = { cell: -1, reachedMm: -1 };
  const strips = [...stripMm.keys()].sort((x, y) => x - y);
  for (let start = 0; start < strips.length;) {
    let end = start;
    while (end + 1 < strips.length && strips[end + 1]! === strips[end]! + 1) end++;
    if (strips[end]! - strips[start]! + 1 >= span) {
      for (let k = start; k <= end; k++) {
        const reached = stripMm.get(strips[k]!)!;
        if (reached > best.reachedMm) best = { cell: stripCell.get(strips[k]!)!, reachedMm: reached };
      }
    }
    start = end + 1;
  }
  return best;
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
 * width, −1 where none reaches): `reached`, or else the first need left unmet with, in `short`, the
 * way that comes nearest to the width it asks; `short` is null when the need has no way whose patch
 * of floor (patchOf) has at least minCells free cells and one a route reaches (for a way asking for
 * a stretch, a stretch that wide): the piece is unreachable. A way's bottleneck is that of its best cell, rounded to the centimetre as
 * findings report it.
 */
export function judgeReach(
  needs: readonly ReachNeed[],
  patchOf: (way: ReachWay) => Patch,
  bottleneckMm: Int32Array,
  minCells: number,
  cellMm: number,
): 'reached' | { need: ReachNeed; short: ShortWay | null } {
  for (const need of needs) {
    let nearest: ShortWay | null = null;
    let met = false;
    for (const way of need) {
      const patch = patchOf(way);
      const best =
        way.stretchMm > 0 ? bestStretch(patch, bottleneckMm, way.stretchMm, cellMm) : bestCell(patch.cells, bottleneckMm);
      if (patch.cells.length < minCells || best.reachedMm < 0) continue;
      if (roundToCmMm(best.reachedMm) >= way.requiredMm) {
        met = true;
        break;
      }
      if (!nearest || best.reachedMm - way.requiredMm > nearest.bottleneckMm - nearest.requiredMm)
        nearest = { cell: best.cell, bottleneckMm: best.reachedMm, requiredMm: way.requiredMm };
    }
    if (!met) return { need, short: nearest };
  }
  return 'reached';
}
