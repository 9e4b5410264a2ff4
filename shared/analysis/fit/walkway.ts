// `narrow-walkway` and `unreachable`: can a person walk from a door or passage to where each piece is
// used (its front, or the sides reach.ts names), and how narrow is the tightest spot on the best
// route? Plan mm, x right, y down.
import { placeOpening } from '../../geometry/openings';
import {
  faceFrame,
  judgeReach,
  reachNeeds,
  unreachableMessage,
  withSeatGaps,
  type Face,
  type Patch,
  type ReachWay,
} from './reach';
import { layoutShellWalls } from '../../geometry/walls';
import { addScaled, type Vec2 } from '../../geometry/vec';
import type { Piece } from '../../schemas/option';
import type { RoomShell } from '../../schemas/room';
import type { Finding } from './finding';
import { blocksWalking } from '../../geometry/piece';
import { pointInPolygon } from '../../geometry/polygon';
import { closestOnShape, closestPair, distanceToSegmentMm, type ClosestPair, type PieceBox } from './boxes';
import { cellAt, cellCentreMm, FREE, WALL, type FloorGrid } from './floor-grid';
import { routeNarrowest, widestRoutes } from './walkway-grid';
import { floorWidths } from './walkway-floor';
import type { CellBox, Widths } from './walkway-widths';
import { capitalise, cmText, roundToCmMm, theName } from './messages';
import { itemAt } from '../../item-at';

/** Side of a floor cell (mm): fine enough to tell a 60 cm gap from a 62 cm one, coarse enough to check a room in a few milliseconds. */
export const WALKWAY_CELL_MM = 25;
/** How deep (mm) the patch of floor in front of a piece is where a person stands to use it: about a foot's length (common practice). */
export const FRONT_STRIP_MM = 300;
/** A front patch with fewer free cells than this is blocked: a sliver of a few square centimetres is no place to stand. */
export const MIN_FRONT_CELLS = 4;
/** A traced gap is replaced by the exact distance between its two sides when the two agree within this many cells. */
const SNAP_CELLS = 1.5;
/** Two ways of drawing a gap this close (mm) in length show the same gap. */
const SNAP_TOLERANCE_MM = 0.5;

/** Free cells in the patch of floor before one face of a box, FRONT_STRIP_MM deep, and the box of cells its bounds cover. */
function faceCells(grid: FloorGrid, box: PieceBox, face: Face): { patch: Patch; cells: CellBox } {
  const { along, out, halfAlongMm, halfOutMm } = faceFrame(box, face);
  const reachMm = halfOutMm + FRONT_STRIP_MM;
  // The patch's bounds, from its four corners (either end of the face, at the face and a strip out).
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const a of [-halfAlongMm, halfAlongMm]) {
    for (const o of [halfOutMm, reachMm]) {
      const [x, y] = addScaled(addScaled(box.centre, along, a), out, o);
      minX = Math.min(minX, x);
      minY = Math.min(minY, y);
      maxX = Math.max(maxX, x);
      maxY = Math.max(maxY, y);
    }
  }
  const { nx, cellMm, originX, originY, label } = grid;
  const i0 = Math.max(0, Math.floor((minX - originX) / cellMm));
  const i1 = Math.min(nx - 1, Math.floor((maxX - originX) / cellMm));
  const j0 = Math.max(0, Math.floor((minY - originY) / cellMm));
  const j1 = Math.min(grid.ny - 1, Math.floor((maxY - originY) / cellMm));
  const found: Patch = { faceMm: 2 * halfAlongMm, cells: [], alongMm: [] };
  for (let j = j0; j <= j1; j++) {
    for (let i = i0; i <= i1; i++) {
      const cell = j * nx + i;
      if (label[cell] !== FREE) continue;
      const dx = originX + (i + 0.5) * cellMm - box.centre[0];
      const dy = originY + (j + 0.5) * cellMm - box.centre[1];
      const u = dx * along[0] + dy * along[1];
      const v = dx * out[0] + dy * out[1];
      if (Math.abs(u) <= halfAlongMm && v >= halfOutMm && v <= reachMm) {
        found.cells.push(cell);
        found.alongMm.push(u);
      }
    }
  }
  return { patch: found, cells: [i0, i1, j0, j1] };
}

/** A face's patch as last worked out: where its box stood and the cells the patch's bounds cover. */
interface KeptPatch {
  patch: Patch;
  /** The box's centre, x axis and half width and depth (plan mm). */
  fields: [number, number, number, number, number, number];
  cells: CellBox;
}

/**
 * Patches worked out by the last check, by piece id and face, for the widths they were worked out
 * on (and their revision): the next check on those widths, one update later, takes every patch
 * whose box stands where it stood and whose bounds miss the cells that turned free or blocked.
 */
const keptPatches = { widths: null as Widths | null, revision: -1, patches: new Map<string, KeptPatch>() };

/** The patches of the last check that stand for this one (keptPatches). */
function patchesFor(widths: Widths): Map<string, KeptPatch> {
  const turned = widths.changedBox();
  const { patches } = keptPatches;
  if (keptPatches.widths !== widths || keptPatches.revision !== widths.revision - 1 || !turned) patches.clear();
  else {
    const [i0, i1, j0, j1] = turned;
    for (const [key, kept] of patches) {
      const [a0, a1, b0, b1] = kept.cells;
      if (a0 <= i1 && i0 <= a1 && b0 <= j1 && j0 <= b1) patches.delete(key);
    }
  }
  keptPatches.widths = widths;
  keptPatches.revision = widths.revision;
  return patches;
}

/** A face's patch, from the kept ones where its box stands as it stood. */
function patchBefore(grid: FloorGrid, patches: Map<string, KeptPatch>, box: PieceBox, face: Face): Patch {
  const key = `${box.piece.id}\u0000${face}`;
  const kept = patches.get(key);
  if (kept) {
    const [cx, cy, ax, ay, hw, hd] = kept.fields;
    const { centre, axisX, halfWidthMm, halfDepthMm } = box;
    if (cx === centre[0] && cy === centre[1] && ax === axisX[0] && ay === axisX[1] && hw === halfWidthMm && hd === halfDepthMm)
      return kept.patch;
  }
  const fields: KeptPatch['fields'] = [
    box.centre[0],
    box.centre[1],
    box.axisX[0],
    box.axisX[1],
    box.halfWidthMm,
    box.halfDepthMm,
  ];
  const { patch, cells } = faceCells(grid, box, face);
  patches.set(key, { patch, fields, cells });
  return patch;
}

/** The closest pairs worked out for gaps, by the two sides' labels, with the shapes they were of. */
const keptPairs = new Map<string, { shapes: number[]; pair: ClosestPair }>();
/** Kept closest pairs are all dropped past this many (a room has far fewer gaps). */
const KEPT_PAIRS = 2000;

/**
 * closestPair of two sides' shapes, the one worked out before where the shapes are as they were (it
 * depends on nothing else). A wall side is told apart by its segment's first corner.
 */
function closestPairKept(sideA: number, sideB: number, shapeA: readonly Vec2[], shapeB: readonly Vec2[]): ClosestPair {
  const [a0, b0] = [itemAt(shapeA, 0, 'point'), itemAt(shapeB, 0, 'point')];
  const key = `${sideA} ${a0[0]} ${a0[1]} ${sideB} ${b0[0]} ${b0[1]}`;
  const kept = keptPairs.get(key);
  const same = (kept: readonly number[], shapes: readonly Vec2[], from: number) =>
    shapes.every((p, k) => p[0] === kept[from + 2 * k] && p[1] === kept[from + 2 * k + 1]);
  if (
    kept &&
    kept.shapes.length === 2 * (shapeA.length + shapeB.length) &&
    same(kept.shapes, shapeA, 0) &&
    same(kept.shapes, shapeB, 2 * shapeA.length)
  )
    return kept.pair;
  const shapes = [...shapeA, ...shapeB].flat();
  const pair = closestPair(shapeA, shapeB);
  if (keptPairs.size >= KEPT_PAIRS) keptPairs.clear();
  keptPairs.set(key, { shapes, pair });
  return pair;
}

/** A plan point (mm) to a tenth of a millimetre, dropping arithmetic noise from reports. */
function roundPoint(p: Vec2): [number, number] {
  return [Math.round(p[0] * 10) / 10, Math.round(p[1] * 10) / 10];
}

/** The nearest wall (inside-face segment, plan mm) to a point outside the free floor. */
function nearestWall(outline: readonly Vec2[], p: Vec2): [Vec2, Vec2] {
  let best: [Vec2, Vec2] = [itemAt(outline, 0, 'corner'), itemAt(outline, 1 % outline.length, 'corner')];
  let bestMm = Infinity;
  for (let k = 0; k < outline.length; k++) {
    const a = outline[k]!;
    const b = outline[(k + 1) % outline.length]!;
    const d = distanceToSegmentMm(p, a, b);
    if (d < bestMm) {
      bestMm = d;
      best = [a, b];
    }
  }
  return best;
}

function sideShape(side: number, end: Vec2, obstacles: readonly PieceBox[], outline: readonly Vec2[]): readonly Vec2[] {
  return side === WALL ? nearestWall(outline, end) : itemAt(obstacles, side, 'obstacle').corners;
}

function sideName(side: number, obstacles: readonly PieceBox[]): string {
  return side === WALL ? 'the wall' : theName(itemAt(obstacles, side, 'obstacle').piece);
}

/**
 * `narrow-walkway` and `unreachable` for placed pieces (plan mm), with `walkwayMm` the clear width a
 * route needs. Routes start just inside every door and passage; a room with neither has no way in to
 * judge from, so it gets no walkway findings. Pieces walked over (rugs) or under (hung at or above
 * the head clearance) neither block a route nor need one (geometry/piece: blocksWalking). Where each
 * piece is reached from, and at what width, is reach.ts's: `walkwayMm` for most, less for some kinds.
 */
export function findWalkwayProblems(shell: RoomShell, boxes: readonly PieceBox[], walkwayMm: number): Finding[] {
  const ways = shell.openings.filter((o) => o.type !== 'window' && o.wall < shell.outline.length);
  if (ways.length === 0) return [];
  const outline = shell.outline;
  const obstacles = boxes.filter((box) => blocksWalking(box.piece));
  const { filled, owner } = withSeatGaps(obstacles);
  const widths = floorWidths(outline, filled, WALKWAY_CELL_MM, walkwayMm);
  const grid = widths.grid;
  const ownerOf = (side: number) => (side === WALL ? WALL : itemAt(owner, side, 'obstacle'));

  // The floor cells just inside each way in, sampled every half cell along its width.
  const walls = layoutShellWalls(shell);
  const sources: { cell: number; opening: number }[] = [];
  ways.forEach((way, opening) => {
    const wall = itemAt(walls, way.wall, 'wall');
    const placement = placeOpening(wall, way);
    const inward: Vec2 = [-wall.outward[0], -wall.outward[1]];
    for (let s = 0; s <= way.width; s += grid.cellMm / 2) {
      const cell = cellAt(grid, addScaled(addScaled(placement.insideStart, wall.direction, s), inward, grid.cellMm));
      if (cell >= 0 && grid.label[cell] === FREE) sources.push({ cell, opening });
    }
  });
  const limitMm = Math.ceil(walkwayMm);
  const routes = widestRoutes(grid, widths, sources, limitMm);

  const findings: Finding[] = [];
  const narrowestOnRoute = routeNarrowest(widths, routes);
  const patches = patchesFor(widths);
  obstacles.forEach((box, index) => {
    // A piece wholly outside the room is an outside-room finding; a route to it means nothing.
    if (!pointInPolygon(box.centre, outline)) return;
    const piece = box.piece;
    const needs = reachNeeds(box, boxes, walkwayMm);
    const patchOf = (way: ReachWay) => patchBefore(grid, patches, way.box ?? box, way.face);
    const verdict = judgeReach(needs, patchOf, routes.bottleneckMm, MIN_FRONT_CELLS, grid.cellMm);
    if (verdict === 'reached') return;
    if (verdict.short === null) {
      findings.push({
        kind: 'unreachable',
        pieces: [piece.id],
        openings: ways.map((w) => w.id).sort(),
        message: unreachableMessage(piece, verdict.need),
      });
      return;
    }
    const { cell: bestCell, bottleneckMm, requiredMm } = verdict.short;

    // The route's narrowest cell is where the bottleneck is; the route ends at a way in.
    const narrowest = narrowestOnRoute(bestCell);
    const opening = itemAt(ways, routes.wayIn[routes.start[bestCell]!]!, 'way in');
    const finding = describeGap(piece, index, narrowest, bottleneckMm, requiredMm);
    // The exact distance may show the grid's narrow spot to be wide enough after all.
    if ((finding.measuredMm ?? 0) < requiredMm) findings.push({ ...finding, openings: [opening.id] });
  });
  return findings;

  function describeGap(piece: Piece, index: number, cell: number, gridWidthMm: number, requiredMm: number): Finding {
    const at = cellCentreMm(grid, cell);
    const gap = widths.gap(cell);
    let widthMm = gridWidthMm;
    let between: Finding['between'];
    let words: string;
    const involved: string[] = [];
    if (gap) {
      const [sideA, sideB] = gap.sides;
      // The exact distance between the two sides, when it tells the same story as the grid.
      const shapeA = sideShape(sideA, gap.ends[0], filled, outline);
      const shapeB = sideShape(sideB, gap.ends[1], filled, outline);
      const exact = closestPairKept(sideA, sideB, shapeA, shapeB);
      if (Math.abs(exact.distanceMm - gridWidthMm) <= SNAP_CELLS * grid.cellMm) {
        widthMm = exact.distanceMm;
        // Parallel faces are closest all along; draw the gap through the narrow spot itself.
        const throughA = closestOnShape(at, shapeA);
        const throughB = closestOnShape(at, shapeB);
        const acrossMm = Math.hypot(throughA[0] - throughB[0], throughA[1] - throughB[1]);
        between = acrossMm - exact.distanceMm <= SNAP_TOLERANCE_MM ? [throughA, throughB] : [exact.from, exact.to];
      } else {
        between = [gap.ends[0], gap.ends[1]];
      }
      // Pieces before walls, and pieces in the designer's order; a filled gap goes by its seat.
      const [ownA, ownB] = [ownerOf(sideA), ownerOf(sideB)];
      const sides: [number, number] = [ownA, ownB];
      sides.sort((a, b) => (a === WALL ? 1 : b === WALL ? -1 : a - b));
      words = ` between ${sideName(sides[0], obstacles)} and ${sideName(sides[1], obstacles)}`;
      for (const side of sides) if (side !== WALL && side !== index) involved.push(itemAt(obstacles, side, 'obstacle').piece.id);
      if (ownA !== index && ownB !== index) words += ` to reach ${theName(piece)}`;
    } else {
      words = ` on the way to ${theName(piece)}`;
    }
    const measuredMm = roundToCmMm(widthMm);
    return {
      kind: 'narrow-walkway',
      pieces: [piece.id, ...new Set(involved)],
      openings: [],
      message: capitalise(`only ${cmText(measuredMm)} to pass${words}`),
      measuredMm,
      requiredMm: roundToCmMm(requiredMm),
      at: roundPoint(at),
      ...(between ? { between: [roundPoint(between[0]), roundPoint(between[1])] } : {}),
    };
  }
}
