// Doors and passages in the 3D shell, plan mm in, scene metres out: the lining that boards the wall's
// thickness round the opening, an architrave round it on both faces, and each door's leaf open on its
// hinge at DOOR_OPEN_ANGLE_DEG with lighter edges and a lever handle on both sides.
import type { Door } from '../schemas/room';
import { alignedBox, MeshWriter, writeBox, writeBoxFaces, type MeshData } from './mesh-writer';
import { doorSwing, type OpeningPlacement } from './openings';
import { directionDeg, type Vec2 } from './vec';
import type { WallLayout } from './walls';

/** Door leaves are drawn this thick (mm), a usual interior leaf (common practice, no source). */
export const DOOR_LEAF_THICKNESS_MM = 40;
/** The lining boards the wall's thickness round a door or passage this thick (mm) (common practice, no source). */
export const LINING_THICKNESS_MM = 18;
/** Architrave round a door or passage on each face of the wall: width on the face × thickness off it, mm (common practice, no source). */
export const ARCHITRAVE_WIDTH_MM = 70;
export const ARCHITRAVE_THICKNESS_MM = 15;
/** Lever handles sit this high above the floor (mm), this far in from the leaf's free edge (mm) (common practice, no source). */
export const HANDLE_HEIGHT_MM = 1000;
export const HANDLE_BACKSET_MM = 60;
// The lever's parts, mm: a square neck standing off the leaf, the lever running back towards the hinge.
const HANDLE = { neckMm: 18, standOffMm: 55, leverLengthMm: 125, leverMm: 18 } as const;

export interface DoorLeafSceneData {
  openingId: string;
  /** The leaf's two broad faces. */
  mesh: MeshData;
  /** Its top and its hinge and free edges, drawn lighter so the open leaf reads as a door from above. */
  edges: MeshData;
  /** A lever on each face. */
  handles: MeshData;
}

/**
 * The lining and the architraves of one door or passage on its wall (plan mm), written into `writer`:
 * boards on both sides and the head of the wall's thickness, and on each face two legs and a head
 * round the hole, clipped to the wall's length and height.
 */
export function writeOpeningTrim(writer: MeshWriter, wall: WallLayout, placement: OpeningPlacement, wallHeightMm: number): void {
  const t = wall.thicknessMm;
  const { fromMm, toMm, headMm } = placement;
  const lining = Math.min(LINING_THICKNESS_MM, (toMm - fromMm) / 4);
  const box = (a: number, b: number, c: number, d: number, bottomMm: number, topMm: number) => {
    if (b - a <= 0 || d - c <= 0 || topMm - bottomMm <= 0) return;
    writeBox(writer, alignedBox(wall.start, wall.direction, wall.outward, a, b, c, d), bottomMm, topMm - bottomMm);
  };
  box(fromMm, fromMm + lining, 0, t, 0, headMm);
  box(toMm - lining, toMm, 0, t, 0, headMm);
  box(fromMm + lining, toMm - lining, 0, t, headMm - lining, headMm);
  const w = ARCHITRAVE_WIDTH_MM;
  const top = Math.min(headMm + w, wallHeightMm);
  const faces: [number, number, number, number][] = [
    // Inside face: from the wall's start corner to its end; outside face: its mitred extent.
    [0, wall.lengthMm, -ARCHITRAVE_THICKNESS_MM, 0],
    [wall.outerFromMm, wall.outerToMm, t, t + ARCHITRAVE_THICKNESS_MM],
  ];
  for (const [minAlong, maxAlong, c, d] of faces) {
    const left = Math.max(fromMm - w, minAlong);
    const right = Math.min(toMm + w, maxAlong);
    box(left, Math.min(fromMm, maxAlong), c, d, 0, top);
    box(Math.max(toMm, minAlong), right, c, d, 0, top);
    box(Math.max(fromMm, minAlong), Math.min(toMm, maxAlong), c, d, headMm, top);
  }
}

// One lever handle on a face of the leaf: `side` is +1 or −1 across the leaf from its middle plane.
function writeHandle(writer: MeshWriter, hinge: Vec2, open: Vec2, across: Vec2, leafMm: number, middleMm: number, side: 1 | -1) {
  const at = leafMm - HANDLE_BACKSET_MM;
  const face = middleMm + (side * DOOR_LEAF_THICKNESS_MM) / 2;
  const { neckMm, standOffMm, leverLengthMm, leverMm } = HANDLE;
  const bottom = HANDLE_HEIGHT_MM - leverMm / 2;
  const outer = face + side * standOffMm;
  writeBox(
    writer,
    alignedBox(hinge, open, across, at - neckMm / 2, at + neckMm / 2, face, outer - side * leverMm),
    bottom,
    leverMm,
  );
  writeBox(
    writer,
    alignedBox(hinge, open, across, at - leverLengthMm + neckMm / 2, at + neckMm / 2, outer - side * leverMm, outer),
    bottom,
    leverMm,
  );
}

/** A door's leaf open on its hinge at DOOR_OPEN_ANGLE_DEG (openings.ts): faces, lighter edges and its handles. */
export function buildDoorLeaf(wall: WallLayout, opening: Door): DoorLeafSceneData {
  const swing = doorSwing(wall, opening);
  const open = directionDeg(swing.openAngleDeg);
  const closed = directionDeg(swing.closedAngleDeg);
  const faces = new MeshWriter();
  const edges = new MeshWriter();
  const box = alignedBox(swing.hingeMm, open, closed, 0, opening.width, 0, DOOR_LEAF_THICKNESS_MM);
  // The bottom stands on the floor and is never seen.
  writeBoxFaces((face) => (face === 'side' ? faces : face === 'bottom' ? null : edges), box, 0, opening.height);
  const handles = new MeshWriter();
  const middle = DOOR_LEAF_THICKNESS_MM / 2;
  writeHandle(handles, swing.hingeMm, open, closed, opening.width, middle, 1);
  writeHandle(handles, swing.hingeMm, open, closed, opening.width, middle, -1);
  return { openingId: opening.id, mesh: faces.toMesh(), edges: edges.toMesh(), handles: handles.toMesh() };
}
