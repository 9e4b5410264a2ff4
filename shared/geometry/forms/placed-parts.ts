// The direct part writer: each part written once straight into its slot's buffers, placed, with
// the numbers the staged writer (staged-parts.ts) gives, bit for bit. A room's first build runs
// mostly before the engine has compiled it, where every load, store and sum costs a call, so this
// writer places a box's eight corners and an outline's points once each rather than every vertex,
// copies the normals (the same for every part of a shape in a piece turned the same way) as one
// block, and winds a box's triangles from one pattern.
import type { Part } from './parts';
import {
  hypot2,
  isDisc,
  legOutlineInto,
  MM,
  OUTLINE_NORMALS,
  OUTLINE_POINTS,
  roundedOutlineInto,
  SlotWriter,
} from './slot-writer';
import { BOX_FACES, writeBoxStaged, writeExtrusionStaged } from './staged-parts';

/**
 * Numbers this writer takes (mm, either side of zero): products of two stay finite, so every
 * facing test gives the sign the staged writer's full test gives.
 */
const LARGEST_MM = 1e100;
/** A box thinner than this (mm) on any side goes to the staged writer, whose facing test winds it. */
const THINNEST_BOX_MM = 1e-100;

const ordinary = (v: number) => v > -LARGEST_MM && v < LARGEST_MM;

/** Whether the part's own numbers are all ordinary (so are the outline's and the box's made from them). */
function ordinaryPart(part: Part): boolean {
  return (
    ordinary(part.x) &&
    ordinary(part.y) &&
    ordinary(part.z) &&
    ordinary(part.w) &&
    ordinary(part.d) &&
    ordinary(part.h) &&
    ordinary(part.radius ?? 0) &&
    ordinary(part.taper ?? 1)
  );
}

/**
 * The triangle corners of a box of positive size, relative to its first vertex: the staged
 * writer's own for a unit box. Every facing test on a box's face is a product of two of its sides
 * (the other terms are zeros), so any box of positive sides winds the same.
 */
const BOX_INDICES = (() => {
  const w = new SlotWriter();
  w.begin(
    {
      positions: new Float32Array(72),
      normals: new Float32Array(72),
      uvs: new Float32Array(48),
      indices: new Uint32Array(36),
    },
    0,
    0,
    0,
    [1, 0],
  );
  writeBoxStaged(w, { shape: 'box', x: 0, y: 0, z: 0, w: 1, d: 1, h: 1, slot: 'main', role: 'body' });
  return w.indices;
})();

/**
 * Placed normals of every vertex of a part of one shape, for the turn they were worked out for:
 * the same for every such part of a piece (and of pieces turned alike), copied as one block.
 */
interface NormalBlock {
  data: Float32Array;
  a0: number;
  a1: number;
}

const BOX_NORMALS: NormalBlock = { data: new Float32Array(72), a0: NaN, a1: NaN };

/** The placed normals of a box's 24 vertices for the writer's turn. */
function boxNormals(w: SlotWriter): Float32Array {
  const block = BOX_NORMALS;
  if (block.a0 === w.a0 && block.a1 === w.a1) return block.data;
  const B = BOX_FACES,
    D = block.data;
  const a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1;
  for (let f = 0; f < 6; f++) {
    const nx = B[15 * f]!,
      ny = B[15 * f + 1]!,
      nz = B[15 * f + 2]!;
    const px = nx * a0 + ny * b0,
      pz = nx * a1 + ny * b1;
    for (let c = 0; c < 4; c++) {
      const k = 12 * f + 3 * c;
      D[k] = px;
      D[k + 1] = nz;
      D[k + 2] = pz;
    }
  }
  block.a0 = a0;
  block.a1 = a1;
  return D;
}

// Extrusion normal blocks by outline: rounded corners, disc and each leg's number of sides.
const EXTRUSION_NORMALS = new Map<number, NormalBlock>();
const DISC_KEY = 1000;
const LEG_KEY = 2000;

/**
 * The placed normals of an upright prism round the scratch outline's `n` points (its sides' smooth
 * normals, then the top's and the underside's), for the writer's turn; `key` names the outline.
 */
function extrusionNormals(w: SlotWriter, key: number, n: number): Float32Array {
  let block = EXTRUSION_NORMALS.get(key);
  if (!block) {
    block = { data: new Float32Array(18 * n), a0: NaN, a1: NaN };
    EXTRUSION_NORMALS.set(key, block);
  }
  if (block.a0 === w.a0 && block.a1 === w.a1) return block.data;
  const N = OUTLINE_NORMALS,
    D = block.data;
  const a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1;
  for (let i = 0; i < n; i++) {
    const j = i + 1 < n ? i + 1 : 0;
    const six = Math.fround(N[2 * i]!),
      siy = Math.fround(N[2 * i + 1]!),
      sjx = Math.fround(N[2 * j]!),
      sjy = Math.fround(N[2 * j + 1]!);
    const ix = six * a0 + siy * b0,
      iz = six * a1 + siy * b1,
      jx = sjx * a0 + sjy * b0,
      jz = sjx * a1 + sjy * b1;
    // Foot i, foot j, top j, top i; the y of every side normal is 0 (the Float32Array's own).
    const k = 12 * i;
    D[k] = ix;
    D[k + 2] = iz;
    D[k + 3] = jx;
    D[k + 5] = jz;
    D[k + 6] = jx;
    D[k + 8] = jz;
    D[k + 9] = ix;
    D[k + 11] = iz;
  }
  // The caps face straight up and down: their x and z are 0 turned, signed as the turn signs them.
  const cx = 0 * a0 + 0 * b0,
    cz = 0 * a1 + 0 * b1;
  for (let i = 0; i < n; i++) {
    const t = 3 * (4 * n + i),
      b = 3 * (5 * n + i);
    D[t] = cx;
    D[t + 1] = 1;
    D[t + 2] = cz;
    D[b] = cx;
    D[b + 1] = -1;
    D[b + 2] = cz;
  }
  block.a0 = a0;
  block.a1 = a1;
  return D;
}

/** Writes an upright quad's corners (foot a, foot b at y0; top b, top a at y1) and their uvs from `p` and `t`. */
function side(
  P: Float32Array,
  T: Float32Array,
  p: number,
  t: number,
  xa: number,
  za: number,
  xb: number,
  zb: number,
  xc: number,
  zc: number,
  xd: number,
  zd: number,
  y0: number,
  y1: number,
  ua: number,
  ub: number,
  v0: number,
  v1: number,
): void {
  P[p] = xa;
  P[p + 1] = y0;
  P[p + 2] = za;
  P[p + 3] = xb;
  P[p + 4] = y0;
  P[p + 5] = zb;
  P[p + 6] = xc;
  P[p + 7] = y1;
  P[p + 8] = zc;
  P[p + 9] = xd;
  P[p + 10] = y1;
  P[p + 11] = zd;
  T[t] = ua;
  T[t + 1] = v0;
  T[t + 2] = ub;
  T[t + 3] = v0;
  T[t + 4] = ub;
  T[t + 5] = v1;
  T[t + 6] = ua;
  T[t + 7] = v1;
}

/** Writes a cap's four corners at height y, in order round the plan (x0 y0, x1 y0, x1 y1, x0 y1), uvs the plan in metres. */
function cap(
  P: Float32Array,
  T: Float32Array,
  p: number,
  t: number,
  y: number,
  x00: number,
  z00: number,
  x10: number,
  z10: number,
  x11: number,
  z11: number,
  x01: number,
  z01: number,
  u0: number,
  v0: number,
  u1: number,
  v1: number,
): void {
  P[p] = x00;
  P[p + 1] = y;
  P[p + 2] = z00;
  P[p + 3] = x10;
  P[p + 4] = y;
  P[p + 5] = z10;
  P[p + 6] = x11;
  P[p + 7] = y;
  P[p + 8] = z11;
  P[p + 9] = x01;
  P[p + 10] = y;
  P[p + 11] = z01;
  T[t] = u0;
  T[t + 1] = v0;
  T[t + 2] = u1;
  T[t + 3] = v0;
  T[t + 4] = u1;
  T[t + 5] = v1;
  T[t + 6] = u0;
  T[t + 7] = v1;
}

/** A box part: its faces front, back, right, left, top and underside, as the staged writer orders them. */
function writeBox(w: SlotWriter, part: Part): void {
  const x0 = part.x - part.w / 2,
    x1 = part.x + part.w / 2,
    y0 = part.y - part.d / 2,
    y1 = part.y + part.d / 2,
    z0 = part.z,
    z1 = part.z + part.h;
  if (!(ordinaryPart(part) && x1 - x0 >= THINNEST_BOX_MM && y1 - y0 >= THINNEST_BOX_MM && z1 - z0 >= THINNEST_BOX_MM)) {
    writeBoxStaged(w, part);
    return;
  }
  const cx = w.cx,
    cy = w.cy,
    a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1;
  // Each corner rounded to single precision in the piece frame, then placed (scene metres).
  const sx0 = Math.fround(x0),
    sx1 = Math.fround(x1),
    sy0 = Math.fround(y0),
    sy1 = Math.fround(y1);
  const X00 = (cx + sx0 * a0 + sy0 * b0) * MM,
    Z00 = (cy + sx0 * a1 + sy0 * b1) * MM,
    X10 = (cx + sx1 * a0 + sy0 * b0) * MM,
    Z10 = (cy + sx1 * a1 + sy0 * b1) * MM,
    X11 = (cx + sx1 * a0 + sy1 * b0) * MM,
    Z11 = (cy + sx1 * a1 + sy1 * b1) * MM,
    X01 = (cx + sx0 * a0 + sy1 * b0) * MM,
    Z01 = (cy + sx0 * a1 + sy1 * b1) * MM;
  const Y0 = (w.elevation + Math.fround(z0)) * MM,
    Y1 = (w.elevation + Math.fround(z1)) * MM;
  // Sides run u along the face (x or y in metres, signed so it grows left to right seen from outside), v up.
  const ux0 = x0 * MM,
    ux1 = x1 * MM,
    uy0 = y0 * MM,
    uy1 = y1 * MM,
    v0 = z0 * MM,
    v1 = z1 * MM;
  const P = w.positions,
    T = w.uvs,
    first = w.count;
  const p = 3 * first,
    t = 2 * first;
  side(P, T, p, t, X01, Z01, X11, Z11, X11, Z11, X01, Z01, Y0, Y1, ux0, ux1, v0, v1);
  side(P, T, p + 12, t + 8, X10, Z10, X00, Z00, X00, Z00, X10, Z10, Y0, Y1, -ux1, -ux0, v0, v1);
  side(P, T, p + 24, t + 16, X11, Z11, X10, Z10, X10, Z10, X11, Z11, Y0, Y1, -uy1, -uy0, v0, v1);
  side(P, T, p + 36, t + 24, X00, Z00, X01, Z01, X01, Z01, X00, Z00, Y0, Y1, uy0, uy1, v0, v1);
  cap(P, T, p + 48, t + 32, Y1, X00, Z00, X10, Z10, X11, Z11, X01, Z01, ux0, uy0, ux1, uy1);
  cap(P, T, p + 60, t + 40, Y0, X00, Z00, X10, Z10, X11, Z11, X01, Z01, ux0, uy0, ux1, uy1);
  w.normals.set(boxNormals(w), p);
  const I = w.indices,
    B = BOX_INDICES,
    c = w.indexCount;
  for (let k = 0; k < 36; k++) I[c + k] = first + B[k]!;
  w.count = first + 24;
  w.indexCount = c + 36;
}

/**
 * The scratch outline's `n` points as an upright prism from z0 to z1: side quads (foot i, foot j,
 * top j, top i), the top and the underside, the underside being the outline scaled by `scale`
 * about (ccx, ccy). Each triangle is wound by the staged writer's facing test with its zero terms
 * left out (a side's edges along the foot have no height, a cap's none at all).
 */
function writeExtrusion(
  w: SlotWriter,
  n: number,
  key: number,
  z0: number,
  z1: number,
  scale: number,
  ccx: number,
  ccy: number,
): void {
  const O = OUTLINE_POINTS,
    ON = OUTLINE_NORMALS;
  const P = w.positions,
    T = w.uvs,
    I = w.indices;
  const cx = w.cx,
    cy = w.cy,
    a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1;
  const first = w.count;
  w.normals.set(extrusionNormals(w, key, n), 3 * first);
  const dz = z1 - z0;
  const v0 = z0 * MM,
    v1 = z1 * MM;
  const Y0 = (w.elevation + Math.fround(z0)) * MM,
    Y1 = (w.elevation + Math.fround(z1)) * MM;
  const top = first + 4 * n,
    bottom = first + 5 * n;
  const sides = w.indexCount,
    topFan = sides + 6 * n,
    bottomFan = topFan + 3 * (n - 2);
  // Point i (carried from the last step): top (p) and foot (q) in the piece frame, normal, placed top and foot.
  const p0x = O[0]!,
    p0y = O[1]!;
  const q0x = ccx + (p0x - ccx) * scale,
    q0y = ccy + (p0y - ccy) * scale;
  let pix = p0x,
    piy = p0y,
    qix = q0x,
    qiy = q0y,
    nix = ON[0]!,
    niy = ON[1]!;
  let sx = Math.fround(pix),
    sy = Math.fround(piy);
  const TX0 = (cx + sx * a0 + sy * b0) * MM,
    TZ0 = (cy + sx * a1 + sy * b1) * MM;
  sx = Math.fround(qix);
  sy = Math.fround(qiy);
  const BX0 = (cx + sx * a0 + sy * b0) * MM,
    BZ0 = (cy + sx * a1 + sy * b1) * MM;
  let TXi = TX0,
    TZi = TZ0,
    BXi = BX0,
    BZi = BZ0;
  let u = 0;
  for (let i = 0; i < n; i++) {
    let pjx = p0x,
      pjy = p0y,
      qjx = q0x,
      qjy = q0y,
      TXj = TX0,
      TZj = TZ0,
      BXj = BX0,
      BZj = BZ0;
    const j = i + 1 < n ? i + 1 : 0;
    if (j > 0) {
      pjx = O[2 * j]!;
      pjy = O[2 * j + 1]!;
      qjx = ccx + (pjx - ccx) * scale;
      qjy = ccy + (pjy - ccy) * scale;
      sx = Math.fround(pjx);
      sy = Math.fround(pjy);
      TXj = (cx + sx * a0 + sy * b0) * MM;
      TZj = (cy + sx * a1 + sy * b1) * MM;
      sx = Math.fround(qjx);
      sy = Math.fround(qjy);
      BXj = (cx + sx * a0 + sy * b0) * MM;
      BZj = (cy + sx * a1 + sy * b1) * MM;
    }
    const njx = ON[2 * j]!,
      njy = ON[2 * j + 1]!;
    const step = hypot2(pjx - pix, pjy - piy);
    const base = first + 4 * i;
    side(P, T, 3 * base, 2 * base, BXi, BZi, BXj, BZj, TXj, TZj, TXi, TZi, Y0, Y1, u * MM, (u + step) * MM, v0, v1);
    // The same two points as the top's and the underside's corner i.
    let k = 3 * (top + i);
    P[k] = TXi;
    P[k + 1] = Y1;
    P[k + 2] = TZi;
    T[2 * (top + i)] = pix * MM;
    T[2 * (top + i) + 1] = piy * MM;
    k = 3 * (bottom + i);
    P[k] = BXi;
    P[k + 1] = Y0;
    P[k + 2] = BZi;
    T[2 * (bottom + i)] = qix * MM;
    T[2 * (bottom + i) + 1] = qiy * MM;
    // The side quad's two triangles, facing the mean of its corners' normals.
    const fx = (nix + njx) / 2,
      fy = (niy + njy) / 2;
    const e1x = qjx - qix,
      e1y = qjy - qiy,
      ex = pjx - qix,
      ey = pjy - qiy,
      e2x = pix - qix,
      e2y = piy - qiy;
    const first1 = (e1y * dz - 0 * ey) * fx + (0 * ex - e1x * dz) * fy;
    const second = (ey * dz - dz * e2y) * fx + (dz * e2x - ex * dz) * fy;
    let c = sides + 6 * i;
    I[c] = base;
    I[c + 1] = first1 >= 0 ? base + 2 : base + 1;
    I[c + 2] = first1 >= 0 ? base + 1 : base + 2;
    I[c + 3] = base;
    I[c + 4] = second >= 0 ? base + 3 : base + 2;
    I[c + 5] = second >= 0 ? base + 2 : base + 3;
    // The caps' fans from corner 0: the triangle (0, i, j).
    if (i >= 1 && j > 0) {
      const upward = (pix - p0x) * (pjy - p0y) - (piy - p0y) * (pjx - p0x);
      c = topFan + 3 * (i - 1);
      I[c] = top;
      I[c + 1] = upward >= 0 ? top + i + 1 : top + i;
      I[c + 2] = upward >= 0 ? top + i : top + i + 1;
      const downward = (qix - q0x) * (qjy - q0y) - (qiy - q0y) * (qjx - q0x);
      c = bottomFan + 3 * (i - 1);
      I[c] = bottom;
      I[c + 1] = -downward >= 0 ? bottom + i + 1 : bottom + i;
      I[c + 2] = -downward >= 0 ? bottom + i : bottom + i + 1;
    }
    u += step;
    pix = pjx;
    piy = pjy;
    qix = qjx;
    qiy = qjy;
    nix = njx;
    niy = njy;
    TXi = TXj;
    TZi = TZj;
    BXi = BXj;
    BZi = BZj;
  }
  w.count = first + 6 * n;
  w.indexCount = sides + 12 * n - 12;
}

/** Writes one part into its slot's writer. */
export function writePart(w: SlotWriter, part: Part): void {
  if (part.shape === 'rounded') {
    const n = roundedOutlineInto(part);
    if (ordinaryPart(part)) writeExtrusion(w, n, isDisc(part) ? DISC_KEY + n : n, part.z, part.z + part.h, 1, 0, 0);
    else writeExtrusionStaged(w, n, part.z, part.z + part.h, 1, 0, 0);
  } else if (part.shape === 'leg') {
    const n = legOutlineInto(part);
    const taper = part.taper ?? 1;
    if (ordinaryPart(part)) writeExtrusion(w, n, LEG_KEY + n, part.z, part.z + part.h, taper, part.x, part.y);
    else writeExtrusionStaged(w, n, part.z, part.z + part.h, taper, part.x, part.y);
  } else writeBox(w, part);
}
