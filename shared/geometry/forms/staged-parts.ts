// The staged part writer: a part's vertices first in the piece's own frame, then placed and its
// polygons fanned with a facing test on every triangle. The direct writer (placed-parts.ts) gives
// the same numbers with less work; this one stays for the parts whose numbers it does not take
// (a box of no size, numbers out of range) and as the reference its tests hold it to.
import type { Part } from './parts';
import {
  DISC_SEGMENTS,
  hypot2,
  legOutlineInto,
  MM,
  OUTLINE_NORMALS,
  OUTLINE_POINTS,
  roundedOutlineInto,
  type SlotWriter,
} from './slot-writer';

/** A part has at most this many vertices (a disc's prism: 20 side quads and two caps) and polygons. */
const MAX_PART_VERTICES = 6 * 4 * DISC_SEGMENTS;
const MAX_PART_POLYGONS = 4 * DISC_SEGMENTS + 2;

// One part's vertices in the piece's own frame (mm, doubles), eight numbers each: position,
// normal, uv; and its polygons, four numbers each: corner count and the normal it faces. A part
// fills them with plain stores, then emit() places them all in one loop: calls with many numbers
// would box every number on the heap, which made most of a room's first build garbage.
const VERTS = new Float64Array(8 * MAX_PART_VERTICES);
const POLYS = new Float64Array(4 * MAX_PART_POLYGONS);

/**
 * Places the part in VERTS (`vertices` of them) and fans each of its `polygons` in POLYS, in
 * order: each vertex is rounded to single precision as it is stored, then turned, moved and
 * scaled to scene metres, so the numbers are those of storing the form first and placing it
 * afterwards.
 */
function emit(w: SlotWriter, vertices: number, polygons: number): void {
  const V = VERTS,
    F = POLYS;
  const P = w.positions,
    N = w.normals,
    T = w.uvs,
    I = w.indices;
  const cx = w.cx,
    cy = w.cy,
    a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1,
    elevation = w.elevation;
  const first = w.count;
  for (let v = 0, i = first; v < vertices; v++, i++) {
    const k = 8 * v;
    const sx = Math.fround(V[k]!),
      sy = Math.fround(V[k + 1]!),
      snx = Math.fround(V[k + 3]!),
      sny = Math.fround(V[k + 4]!);
    P[3 * i] = (cx + sx * a0 + sy * b0) * MM;
    P[3 * i + 1] = (elevation + Math.fround(V[k + 2]!)) * MM;
    P[3 * i + 2] = (cy + sx * a1 + sy * b1) * MM;
    N[3 * i] = snx * a0 + sny * b0;
    N[3 * i + 1] = V[k + 5]!;
    N[3 * i + 2] = snx * a1 + sny * b1;
    T[2 * i] = V[k + 6]!;
    T[2 * i + 1] = V[k + 7]!;
  }
  w.count = first + vertices;
  // Each polygon a fan from its first corner, each triangle wound by the facing test on the
  // unrounded positions.
  let at = 0;
  let c = w.indexCount;
  for (let q = 0; q < polygons; q++) {
    const n = F[4 * q]!,
      fx = F[4 * q + 1]!,
      fy = F[4 * q + 2]!,
      fz = F[4 * q + 3]!;
    const base = first + at;
    const k0 = 8 * at;
    const ax = V[k0]!,
      ay = V[k0 + 1]!,
      az = V[k0 + 2]!;
    for (let j = 1; j + 1 < n; j++) {
      const kb = k0 + 8 * j,
        kc = kb + 8;
      const e1x = V[kb]! - ax,
        e1y = V[kb + 1]! - ay,
        e1z = V[kb + 2]! - az;
      const e2x = V[kc]! - ax,
        e2y = V[kc + 1]! - ay,
        e2z = V[kc + 2]! - az;
      const facing = (e1y * e2z - e1z * e2y) * fx + (e1z * e2x - e1x * e2z) * fy + (e1x * e2y - e1y * e2x) * fz;
      I[c] = base;
      if (facing >= 0) {
        I[c + 1] = base + j + 1;
        I[c + 2] = base + j;
      } else {
        I[c + 1] = base + j;
        I[c + 2] = base + j + 1;
      }
      c += 3;
    }
    at += n;
  }
  w.indexCount = c;
}

// A box's six faces in order (front +y, back −y, right +x, left −x, top, underside): the normal
// each faces, then its four corners in order round it as which of x0/x1, y0/y1, z0/z1 they take.
// Sides run u along the face (the coordinate and sign in BOX_U) and v up; the top and underside
// take the plan position in metres.
// prettier-ignore
export const BOX_FACES = new Int8Array([
  0, 1, 0, /* corners */ 0, 1, 0, 1, 1, 0, 1, 1, 1, 0, 1, 1,
  0, -1, 0, /* corners */ 1, 0, 0, 0, 0, 0, 0, 0, 1, 1, 0, 1,
  1, 0, 0, /* corners */ 1, 1, 0, 1, 0, 0, 1, 0, 1, 1, 1, 1,
  -1, 0, 0, /* corners */ 0, 0, 0, 0, 1, 0, 0, 1, 1, 0, 0, 1,
  0, 0, 1, /* corners */ 0, 0, 1, 1, 0, 1, 1, 1, 1, 0, 1, 1,
  0, 0, -1, /* corners */ 0, 0, 0, 1, 0, 0, 1, 1, 0, 0, 1, 0,
]);
/** For each side face, u is this plan coordinate (0 x, 1 y) times this sign. */
// prettier-ignore
export const BOX_U = new Int8Array([0, 1, 0, -1, 1, -1, 1, 1]);
/** The box's extents, x0 x1 y0 y1 z0 z1, for the corners to pick from. */
const BOX_EXTENTS = new Float64Array(6);

/** A box part (box or panel) through the staged writer. */
export function writeBoxStaged(w: SlotWriter, part: Part): void {
  const E = BOX_EXTENTS,
    V = VERTS,
    F = POLYS,
    B = BOX_FACES,
    U = BOX_U;
  E[0] = part.x - part.w / 2;
  E[1] = part.x + part.w / 2;
  E[2] = part.y - part.d / 2;
  E[3] = part.y + part.d / 2;
  E[4] = part.z;
  E[5] = part.z + part.h;
  for (let f = 0; f < 6; f++) {
    const nx = B[15 * f]!,
      ny = B[15 * f + 1]!,
      nz = B[15 * f + 2]!;
    F[4 * f] = 4;
    F[4 * f + 1] = nx;
    F[4 * f + 2] = ny;
    F[4 * f + 3] = nz;
    for (let c = 0; c < 4; c++) {
      const k = 8 * (4 * f + c);
      const x = E[B[15 * f + 3 + 3 * c]!]!,
        y = E[2 + B[15 * f + 4 + 3 * c]!]!,
        z = E[4 + B[15 * f + 5 + 3 * c]!]!;
      V[k] = x;
      V[k + 1] = y;
      V[k + 2] = z;
      V[k + 3] = nx;
      V[k + 4] = ny;
      V[k + 5] = nz;
      if (f < 4) {
        V[k + 6] = U[2 * f + 1]! * (U[2 * f] === 0 ? x : y) * MM;
        V[k + 7] = z * MM;
      } else {
        V[k + 6] = x * MM;
        V[k + 7] = y * MM;
      }
    }
  }
  emit(w, 24, 6);
}

// The scratch outline's `n` points as an upright prism from z0 to z1: its sides (smooth normals
// round it, u running along the outline), its top and its underside. The underside is the
// outline scaled by `bottomScale` about (cx, cy).
function writeExtrusionStaged(
  w: SlotWriter,
  n: number,
  z0: number,
  z1: number,
  bottomScale: number,
  cx: number,
  cy: number,
): void {
  const P = OUTLINE_POINTS,
    N = OUTLINE_NORMALS,
    V = VERTS,
    F = POLYS;
  const v0 = z0 * MM,
    v1 = z1 * MM;
  let u = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const pix = P[2 * i]!,
      piy = P[2 * i + 1]!,
      pjx = P[2 * j]!,
      pjy = P[2 * j + 1]!;
    const step = hypot2(pjx - pix, pjy - piy);
    const nix = N[2 * i]!,
      niy = N[2 * i + 1]!,
      njx = N[2 * j]!,
      njy = N[2 * j + 1]!;
    const u0 = u * MM,
      u1 = (u + step) * MM;
    // Foot i, foot j, top j, top i.
    const k = 32 * i;
    V[k] = cx + (pix - cx) * bottomScale;
    V[k + 1] = cy + (piy - cy) * bottomScale;
    V[k + 2] = z0;
    V[k + 3] = nix;
    V[k + 4] = niy;
    V[k + 5] = 0;
    V[k + 6] = u0;
    V[k + 7] = v0;
    V[k + 8] = cx + (pjx - cx) * bottomScale;
    V[k + 9] = cy + (pjy - cy) * bottomScale;
    V[k + 10] = z0;
    V[k + 11] = njx;
    V[k + 12] = njy;
    V[k + 13] = 0;
    V[k + 14] = u1;
    V[k + 15] = v0;
    V[k + 16] = pjx;
    V[k + 17] = pjy;
    V[k + 18] = z1;
    V[k + 19] = njx;
    V[k + 20] = njy;
    V[k + 21] = 0;
    V[k + 22] = u1;
    V[k + 23] = v1;
    V[k + 24] = pix;
    V[k + 25] = piy;
    V[k + 26] = z1;
    V[k + 27] = nix;
    V[k + 28] = niy;
    V[k + 29] = 0;
    V[k + 30] = u0;
    V[k + 31] = v1;
    F[4 * i] = 4;
    F[4 * i + 1] = (nix + njx) / 2;
    F[4 * i + 2] = (niy + njy) / 2;
    F[4 * i + 3] = 0;
    u += step;
  }
  // The top, then the underside.
  for (let i = 0; i < n; i++) {
    const px = P[2 * i]!,
      py = P[2 * i + 1]!;
    const bx = cx + (px - cx) * bottomScale,
      by = cy + (py - cy) * bottomScale;
    const t = 8 * (4 * n + i),
      b = 8 * (5 * n + i);
    V[t] = px;
    V[t + 1] = py;
    V[t + 2] = z1;
    V[t + 3] = 0;
    V[t + 4] = 0;
    V[t + 5] = 1;
    V[t + 6] = px * MM;
    V[t + 7] = py * MM;
    V[b] = bx;
    V[b + 1] = by;
    V[b + 2] = z0;
    V[b + 3] = 0;
    V[b + 4] = 0;
    V[b + 5] = -1;
    V[b + 6] = bx * MM;
    V[b + 7] = by * MM;
  }
  F[4 * n] = n;
  F[4 * n + 1] = 0;
  F[4 * n + 2] = 0;
  F[4 * n + 3] = 1;
  F[4 * n + 4] = n;
  F[4 * n + 5] = 0;
  F[4 * n + 6] = 0;
  F[4 * n + 7] = -1;
  emit(w, 6 * n, n + 2);
}

/** Writes one part into its slot's writer through the staged writer. */
export function writePartStaged(w: SlotWriter, part: Part): void {
  if (part.shape === 'rounded') writeExtrusionStaged(w, roundedOutlineInto(part), part.z, part.z + part.h, 1, 0, 0);
  else if (part.shape === 'leg')
    writeExtrusionStaged(w, legOutlineInto(part), part.z, part.z + part.h, part.taper ?? 1, part.x, part.y);
  else writeBoxStaged(w, part);
}
