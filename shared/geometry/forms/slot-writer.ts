// Where the part writers write: one slot's mesh buffers with how far they are filled, the piece's
// placement, and the outline of a rounded part or a leg round it (scratch arrays reused by every
// part). Shared by the direct writer (placed-parts.ts) and the staged one it falls back to.
import type { MeshData } from '../scene';
import type { Part } from './parts';

/** Piece frame millimetres to scene metres. */
export const MM = 1 / 1000;
/** Segments per quarter of a rounded corner (a disc gets four of them). */
const CORNER_SEGMENTS = 3;
export const DISC_SEGMENTS = 5;
/** Sides round a leg: slim legs need few, lamp shades and pots more. */
const LEG_SIDES = 8;
const WIDE_LEG_SIDES = 14;
const WIDE_LEG_MM = 120;

/** A rounded part whose straight runs are shorter than this (mm) is a disc. */
const DISC_RUN_MM = 1e-6;

/** Whether a rounded part is a disc: both straight runs vanish. */
export function isDisc(part: Part): boolean {
  const r = part.radius ?? 0;
  return part.w / 2 - r < DISC_RUN_MM && part.d / 2 - r < DISC_RUN_MM;
}

export const legSides = (part: Part) => (part.w > WIDE_LEG_MM ? WIDE_LEG_SIDES : LEG_SIDES);

/** Points round a rounded part's outline. */
export function roundedPoints(part: Part): number {
  return isDisc(part) ? 4 * DISC_SEGMENTS : 4 * (CORNER_SEGMENTS + 1);
}

/** Shared by every slot that has no parts (nothing is ever written to a mesh once made). */
export const EMPTY_MESH: MeshData = {
  positions: new Float32Array(0),
  normals: new Float32Array(0),
  uvs: new Float32Array(0),
  indices: new Uint32Array(0),
};

/**
 * One slot of a form being written: its buffers (sized by the plan), how many vertices and
 * triangle corners are in so far, and where the piece stands: centre (plan mm), its own x and y
 * axes on the plan, underside (mm). The piece frame (x, y, z up) maps to the scene (x, z, y up)
 * through a mirror whatever the turn, so triangles are wound clockwise in the piece frame to face
 * outwards once placed.
 */
export class SlotWriter {
  positions = EMPTY_MESH.positions;
  normals = EMPTY_MESH.normals;
  uvs = EMPTY_MESH.uvs;
  indices = EMPTY_MESH.indices;
  count = 0;
  indexCount = 0;
  // Doubles from the start, so the fields never change representation.
  cx = 0.5;
  cy = 0.5;
  a0 = 0.5;
  a1 = 0.5;
  b0 = 0.5;
  b1 = 0.5;
  elevation = 0.5;

  /** Points the writer at `mesh`, placed at (x, y, elevation) mm turned to `axis`. */
  begin(mesh: MeshData, x: number, y: number, elevation: number, axis: readonly [number, number]): void {
    this.positions = mesh.positions;
    this.normals = mesh.normals;
    this.uvs = mesh.uvs;
    this.indices = mesh.indices;
    this.count = 0;
    this.indexCount = 0;
    this.cx = x;
    this.cy = y;
    this.a0 = axis[0];
    this.a1 = axis[1];
    this.b0 = -axis[1];
    this.b1 = axis[0];
    this.elevation = elevation;
  }
}

// An outline round a part, written into scratch arrays (x, y pairs) reused for every part.
export const OUTLINE_POINTS = new Float64Array(2 * 64);
export const OUTLINE_NORMALS = new Float64Array(2 * 64);

/** Cosines and sines of an outline's angles, worked out once. */
export interface Turns {
  cos: Float64Array;
  sin: Float64Array;
}

// By segments per quarter or sides round a leg, with the same expressions the outlines use (so
// every number is the same).
const CORNER_TURNS = new Map<number, Turns>();
const LEG_TURNS = new Map<number, Turns>();

function cornerTurns(segments: number): Turns {
  let t = CORNER_TURNS.get(segments);
  if (!t) {
    t = { cos: new Float64Array(4 * (segments + 1)), sin: new Float64Array(4 * (segments + 1)) };
    for (let c = 0; c < 4; c++) {
      const start = c === 0 ? 0 : c === 1 ? Math.PI / 2 : c === 2 ? Math.PI : (3 * Math.PI) / 2;
      for (let i = 0; i <= segments; i++) {
        const a = start + (i / segments) * (Math.PI / 2);
        t.cos[c * (segments + 1) + i] = Math.cos(a);
        t.sin[c * (segments + 1) + i] = Math.sin(a);
      }
    }
    CORNER_TURNS.set(segments, t);
  }
  return t;
}

function legTurns(sides: number): Turns {
  let t = LEG_TURNS.get(sides);
  if (!t) {
    t = { cos: new Float64Array(sides), sin: new Float64Array(sides) };
    for (let i = 0; i < sides; i++) {
      const a = (i / sides) * Math.PI * 2;
      t.cos[i] = Math.cos(a);
      t.sin[i] = Math.sin(a);
    }
    LEG_TURNS.set(sides, t);
  }
  return t;
}

/** Writes a rounded part's plan outline (piece frame mm) into the scratch arrays, corner by corner; returns how many points. */
export function roundedOutlineInto(part: Part): number {
  const r = part.radius ?? 0;
  const hx = part.w / 2 - r;
  const hy = part.d / 2 - r;
  const disc = isDisc(part);
  const segments = disc ? DISC_SEGMENTS : CORNER_SEGMENTS;
  const P = OUTLINE_POINTS,
    N = OUTLINE_NORMALS;
  const { cos, sin } = cornerTurns(segments);
  let k = 0;
  for (let c = 0; c < 4; c++) {
    const cx = c === 0 || c === 3 ? hx : -hx;
    const cy = c < 2 ? hy : -hy;
    for (let i = 0; i <= segments; i++) {
      if (disc && i === segments) continue;
      const nx = cos[c * (segments + 1) + i]!,
        ny = sin[c * (segments + 1) + i]!;
      P[2 * k] = part.x + cx + nx * r;
      P[2 * k + 1] = part.y + cy + ny * r;
      N[2 * k] = nx;
      N[2 * k + 1] = ny;
      k++;
    }
  }
  return k;
}

/** Writes a leg's outline at its top (piece frame mm) into the scratch arrays, round it; returns how many points. */
export function legOutlineInto(part: Part): number {
  const sides = legSides(part);
  const r = part.w / 2;
  const P = OUTLINE_POINTS,
    N = OUTLINE_NORMALS;
  const { cos, sin } = legTurns(sides);
  for (let i = 0; i < sides; i++) {
    N[2 * i] = cos[i]!;
    N[2 * i + 1] = sin[i]!;
    P[2 * i] = part.x + cos[i]! * r;
    P[2 * i + 1] = part.y + sin[i]! * r;
  }
  return sides;
}

/**
 * The length of (dx, dy) with the same steps as V8's Math.hypot (each side scaled by the larger,
 * squares summed; for two numbers its compensated sum reduces to this): the same number for any
 * finite sides, without a call that gathers its arguments. The larger side scaled by itself is
 * exactly 1, so one division does.
 */
export function hypot2(dx: number, dy: number): number {
  const a = Math.abs(dx),
    b = Math.abs(dy);
  const max = a > b ? a : b;
  if (max === Infinity) return Infinity;
  if (max !== max) return NaN;
  if (max === 0) return 0;
  const t = (a > b ? b : a) / max;
  return Math.sqrt(1 + t * t) * max;
}
