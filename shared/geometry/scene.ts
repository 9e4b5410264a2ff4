// The 3D scene meshes for one room and option in scene metres: floor, ceiling, each wall's faces with
// openings cut out, reveals, door leaves, window frames and panes, and placed pieces as boxes.
import type { Piece } from '../schemas/option';
import type { RoomShell } from '../schemas/room';
import { placeOpening, type OpeningPlacement } from './openings';
import { buildDoorLeaf, writeOpeningTrim, type DoorLeafSceneData } from './shell-doors';
import { buildWindow, type WindowSceneData } from './shell-windows';
import { piecePlanBox } from './piece';
import { areaMm2 } from './polygon';
import {
  DOWN,
  MeshWriter,
  MM_TO_M,
  planToScene,
  sceneDirection,
  UP,
  writeBox,
  writeCap,
  type MeshData,
  type Vec3,
} from './mesh-writer';
import { skirtingMesh, skirtingRuns } from './skirting';
import { POINT_TOLERANCE_MM } from './tolerances';
import { layoutShellWalls, type WallLayout } from './walls';
import { addScaled, type Vec2 } from './vec';
import { itemAt } from '../item-at';

// Scene space: metres, y up; plan (x, y) mm sits at scene (x/1000, height/1000, y/1000), so seen
// from above the scene matches the plan without a mirror. Every mesh is plain typed arrays so the
// client can hand them straight to BufferGeometry and tests can read them without three.js.

export { DOOR_LEAF_THICKNESS_MM, type DoorLeafSceneData } from './shell-doors';
export { GLASS_THICKNESS_MM, WINDOW_FRAME_DEPTH_MM, WINDOW_FRAME_WIDTH_MM, type WindowSceneData } from './shell-windows';

export { meshFromArrays, planToScene, type MeshData } from './mesh-writer';

/** Axis-aligned box in scene metres. */
export interface Bounds3 {
  min: [number, number, number];
  max: [number, number, number];
}

/** All surfaces of one wall in scene metres, so each wall can take its own finish or be faded alone. */
export interface WallSceneData {
  index: number;
  /** The face seen from inside the room; u runs along the wall from its start corner, v up from the floor. */
  inside: MeshData;
  outside: MeshData;
  top: MeshData;
  /** The wall's thickness inside each of its openings: sides, head and bottom. */
  reveals: MeshData;
  /** Linings and architraves (both faces) round its doors and passages. */
  trims: MeshData;
  /** Middle of the inside face at half height, scene metres. */
  centre: [number, number, number];
  /** Horizontal unit vector out of the room, scene axes. */
  outward: [number, number, number];
}

export interface PieceSceneData {
  id: string;
  status: Piece['status'];
  mesh: MeshData;
}

/** Everything the 3D view draws for one room and one option, scene metres, keyed by wall index or document id. */
/** The room itself, without its pieces: what stays put while an option changes. */
export interface ShellSceneData {
  floor: MeshData;
  /** Faces down, seen from inside the room. */
  ceiling: MeshData;
  walls: WallSceneData[];
  /** The skirting runs the take-off counts (geometry/skirting), as one mesh. */
  skirting: MeshData;
  doorLeaves: DoorLeafSceneData[];
  windows: WindowSceneData[];
  /** Of the shell alone. */
  bounds: Bounds3;
}

/** A room and an option's placed pieces; bounds hold both. */
export interface RoomSceneData extends ShellSceneData {
  pieces: PieceSceneData[];
}

/** The meshes sceneMeshes and sceneBounds read: a shell, with or without pieces. */
export type SceneSurfaces = Omit<ShellSceneData, 'bounds'> & { pieces?: readonly PieceSceneData[] };

interface Hole {
  fromMm: number;
  toMm: number;
  bottomMm: number;
  topMm: number;
}

function sortedStops(values: number[], min: number, max: number): number[] {
  const inside = values.filter((v) => v > min && v < max);
  return [min, ...Array.from(new Set(inside)).sort((a, b) => a - b), max];
}

// A vertical wall face between along-wall positions fromMm and toMm (measured from the wall's start
// corner), with rectangular holes, written as a grid of rectangles that skips the cells in holes.
function writeWallFace(
  writer: MeshWriter,
  wall: WallLayout,
  faceOffsetMm: number,
  fromMm: number,
  toMm: number,
  heightMm: number,
  holes: readonly Hole[],
  normal: Vec3,
): void {
  const us = sortedStops(
    holes.flatMap((h) => [h.fromMm, h.toMm]),
    fromMm,
    toMm,
  );
  const vs = sortedStops(
    holes.flatMap((h) => [h.bottomMm, h.topMm]),
    0,
    heightMm,
  );
  const base = addScaled(wall.start, wall.outward, faceOffsetMm);
  const at = (u: number, v: number) => planToScene(addScaled(base, wall.direction, u), v);
  for (let i = 0; i + 1 < us.length; i++) {
    const u0 = us[i]!;
    const u1 = us[i + 1]!;
    const um = (u0 + u1) / 2;
    for (let j = 0; j + 1 < vs.length; j++) {
      const v0 = vs[j]!;
      const v1 = vs[j + 1]!;
      const vm = (v0 + v1) / 2;
      if (holes.some((h) => um > h.fromMm && um < h.toMm && vm > h.bottomMm && vm < h.topMm)) continue;
      const tu0 = (u0 - fromMm) * MM_TO_M;
      const tu1 = (u1 - fromMm) * MM_TO_M;
      writer.quad(
        [at(u0, v0), at(u1, v0), at(u1, v1), at(u0, v1)],
        [
          [tu0, v0 * MM_TO_M],
          [tu1, v0 * MM_TO_M],
          [tu1, v1 * MM_TO_M],
          [tu0, v1 * MM_TO_M],
        ],
        normal,
      );
    }
  }
}

// The wall's thickness round one opening: both sides, the head, and the bottom (a sill for windows,
// a threshold for doors and passages) so the hole reads as closed from every angle.
function writeReveals(writer: MeshWriter, wall: WallLayout, placement: OpeningPlacement): void {
  const t = wall.thicknessMm;
  const d = sceneDirection(wall.direction);
  const back: Vec3 = [-d[0], 0, -d[2]];
  const tM = t * MM_TO_M;
  for (const [alongMm, normal] of [
    [placement.fromMm, d],
    [placement.toMm, back],
  ] as const) {
    const inner = addScaled(wall.start, wall.direction, alongMm);
    const outer = addScaled(inner, wall.outward, t);
    const s = placement.sillMm * MM_TO_M;
    const h = placement.headMm * MM_TO_M;
    writer.quad(
      [
        planToScene(inner, placement.sillMm),
        planToScene(outer, placement.sillMm),
        planToScene(outer, placement.headMm),
        planToScene(inner, placement.headMm),
      ],
      [
        [0, s],
        [tM, s],
        [tM, h],
        [0, h],
      ],
      normal,
    );
  }
  const lengthM = (placement.toMm - placement.fromMm) * MM_TO_M;
  for (const [heightMm, normal] of [
    [placement.headMm, DOWN],
    [placement.sillMm, UP],
  ] as const) {
    writer.quad(
      [
        planToScene(placement.insideStart, heightMm),
        planToScene(placement.insideEnd, heightMm),
        planToScene(placement.outsideEnd, heightMm),
        planToScene(placement.outsideStart, heightMm),
      ],
      [
        [0, 0],
        [lengthM, 0],
        [lengthM, tM],
        [0, tM],
      ],
      normal,
    );
  }
}

function buildWall(wall: WallLayout, placements: readonly OpeningPlacement[], heightMm: number): WallSceneData {
  const holes: Hole[] = placements.map((p) => ({ fromMm: p.fromMm, toMm: p.toMm, bottomMm: p.sillMm, topMm: p.headMm }));
  const outward = sceneDirection(wall.outward);
  const inward: Vec3 = [-outward[0], 0, -outward[2]];

  const inside = new MeshWriter();
  writeWallFace(inside, wall, 0, 0, wall.lengthMm, heightMm, holes, inward);

  const outside = new MeshWriter();
  // The outside face may be shorter than the inside one (re-entrant corners), so holes are clipped to it.
  writeWallFace(outside, wall, wall.thicknessMm, wall.outerFromMm, wall.outerToMm, heightMm, holes, outward);
  const top = new MeshWriter();
  writeCap(top, [wall.start, wall.end, wall.outerEnd, wall.outerStart], heightMm, UP);
  if (wall.startJoin) {
    const join = wall.startJoin;
    const widthM = Math.hypot(join.to[0] - join.from[0], join.to[1] - join.from[1]) * MM_TO_M;
    const h = heightMm * MM_TO_M;
    outside.quad(
      [planToScene(join.from, 0), planToScene(join.to, 0), planToScene(join.to, heightMm), planToScene(join.from, heightMm)],
      [
        [0, 0],
        [widthM, 0],
        [widthM, h],
        [0, h],
      ],
      sceneDirection(join.normal),
    );
    // A step between collinear walls has no top to fill; a cut corner leaves a triangle.
    const gap: Vec2[] = [join.corner, join.from, join.to];
    if (areaMm2(gap) > POINT_TOLERANCE_MM * POINT_TOLERANCE_MM) writeCap(top, gap, heightMm, UP);
  }

  const reveals = new MeshWriter();
  const trims = new MeshWriter();
  for (const placement of placements) {
    writeReveals(reveals, wall, placement);
    if (placement.type !== 'window') writeOpeningTrim(trims, wall, placement, heightMm);
  }

  const middle = addScaled(wall.start, wall.direction, wall.lengthMm / 2);
  return {
    index: wall.index,
    inside: inside.toMesh(),
    outside: outside.toMesh(),
    top: top.toMesh(),
    reveals: reveals.toMesh(),
    trims: trims.toMesh(),
    centre: planToScene(middle, heightMm / 2),
    outward: [outward[0], 0, outward[2]],
  };
}

/** The room shell (plan mm) as scene meshes (metres): floor, ceiling, walls, door leaves and windows. */
export function buildShellScene(shell: RoomShell): ShellSceneData {
  const walls = layoutShellWalls(shell);
  const placementsByWall: OpeningPlacement[][] = walls.map(() => []);
  const doorLeaves: DoorLeafSceneData[] = [];
  const windows: WindowSceneData[] = [];
  for (const opening of shell.openings) {
    const wall = walls[opening.wall];
    if (!wall) continue;
    const placement = placeOpening(wall, opening);
    itemAt(placementsByWall, opening.wall, 'wall').push(placement);
    if (opening.type === 'door') doorLeaves.push(buildDoorLeaf(wall, opening));
    else if (opening.type === 'window') windows.push(buildWindow(wall, placement));
  }

  const floor = new MeshWriter();
  writeCap(floor, shell.outline, 0, UP);
  const ceiling = new MeshWriter();
  writeCap(ceiling, shell.outline, shell.wallHeight, DOWN);

  const wallData = walls.map((wall) => buildWall(wall, itemAt(placementsByWall, wall.index, 'wall'), shell.wallHeight));
  const skirting = skirtingMesh(shell, skirtingRuns(shell));
  const surfaces = { floor: floor.toMesh(), ceiling: ceiling.toMesh(), walls: wallData, skirting, doorLeaves, windows };
  return { ...surfaces, bounds: sceneBounds(surfaces) };
}

/** An option's placed pieces as boxes on their footprints (geometry/piece), scene metres. */
export function buildPiecesScene(pieces: readonly Piece[]): PieceSceneData[] {
  const built: PieceSceneData[] = [];
  for (const piece of pieces) {
    if (!piece.placed) continue;
    const writer = new MeshWriter();
    writeBox(writer, piecePlanBox(piece), piece.elevation, piece.height);
    built.push({ id: piece.id, status: piece.status, mesh: writer.toMesh() });
  }
  return built;
}

/** Everything to draw for a room shell (plan mm) and an option's placed pieces, in scene metres. */
export function buildRoomScene(shell: RoomShell, option: { pieces: readonly Piece[] }): RoomSceneData {
  const room = buildShellScene(shell);
  const pieces = buildPiecesScene(option.pieces);
  return { ...room, pieces, bounds: sceneBounds({ ...room, pieces }) };
}

function emptyBounds(): Bounds3 {
  return { min: [Infinity, Infinity, Infinity], max: [-Infinity, -Infinity, -Infinity] };
}

/** Grows `into` (scene metres) to hold every position of a mesh; returns it. */
export function extendBounds(into: Bounds3, mesh: MeshData): Bounds3 {
  const p = mesh.positions;
  for (let i = 0; i < p.length; i += 3) {
    for (let axis = 0; axis < 3; axis++) {
      const value = p[i + axis]!;
      if (value < into.min[axis]!) into.min[axis] = value;
      if (value > into.max[axis]!) into.max[axis] = value;
    }
  }
  return into;
}

/** Axis-aligned bounds (scene metres) of one mesh; empty meshes give min +∞ and max −∞. */
export function meshBounds(mesh: MeshData): Bounds3 {
  return extendBounds(emptyBounds(), mesh);
}

/** Every mesh of a room scene, for bounds, counts and disposal. */
export function sceneMeshes(scene: SceneSurfaces): MeshData[] {
  return [
    scene.floor,
    scene.ceiling,
    ...scene.walls.flatMap((w) => [w.inside, w.outside, w.top, w.reveals, w.trims]),
    scene.skirting,
    ...(scene.pieces ?? []).map((p) => p.mesh),
    ...scene.doorLeaves.flatMap((d) => [d.mesh, d.edges, d.handles]),
    ...scene.windows.flatMap((w) => [w.frame, w.glass, w.sill]),
  ];
}

/** Axis-aligned bounds (scene metres) of everything in a room scene: walls, pieces, leaves. */
export function sceneBounds(scene: SceneSurfaces): Bounds3 {
  const bounds = emptyBounds();
  for (const mesh of sceneMeshes(scene)) extendBounds(bounds, mesh);
  return bounds;
}
