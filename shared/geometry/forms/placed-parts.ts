// The direct part writer: each part written once straight into its slot's buffers, placed, with
// the numbers the staged writer (staged-parts.ts) gives, bit for bit. A room's first build runs
// mostly before the engine has compiled it, where every sum makes a new number on the heap and
// every load and store is a call, so this writer places a box's eight corners and an outline's
// points once each rather than every vertex, copies the normals (the same for every part of one
// outline in pieces turned alike) as one block, and winds a box and a prism's sides and caps from
// what their shapes make certain instead of testing every triangle. Parts whose numbers it does not
// take go to the staged writer.
import { boxPart, type Part } from './parts';
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
import { BOX_FACES, BOX_U, writeBoxStaged, writePartStaged } from './staged-parts';

/**
 * Numbers this writer takes (mm, either side of zero): products of two stay finite, so every
 * facing test gives the sign the staged writer's full test gives.
 */
const LARGEST_MM = 1e100;
/** A box thinner than this (mm) on any side goes to the staged writer, whose facing test winds it. */
const THINNEST_BOX_MM = 1e-100;

/** Rounds to single precision (a module constant: read once, not looked up on Math at every use). */
const fround = Math.fround;

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
  const mesh = {
    positions: new Float32Array(72),
    normals: new Float32Array(72),
    uvs: new Float32Array(48),
    indices: new Uint32Array(36),
  };
  w.begin(mesh, 0, 0, 0, [1, 0]);
  writeBoxStaged(w, boxPart(-0.5, 0.5, -0.5, 0.5, 0, 1));
  return mesh.indices;
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

/** An outline's normal block, with the outline's own normals in single precision (as they are placed). */
interface ExtrusionNormals extends NormalBlock {
  outline: Float32Array;
}

// Extrusion normal blocks by outline (see DISC_KEY).
const EXTRUSION_NORMALS = new Map<number, ExtrusionNormals>();

/**
 * The placed normals of an upright prism round the scratch outline's `n` points (its sides' smooth
 * normals, then the top's and the underside's), for the writer's turn; `key` names the outline.
 */
function extrusionNormals(w: SlotWriter, key: number, n: number): Float32Array {
  let block = EXTRUSION_NORMALS.get(key);
  if (!block) {
    // The scratch outline's normals are the outline's whatever its size.
    block = { data: new Float32Array(18 * n), a0: NaN, a1: NaN, outline: new Float32Array(OUTLINE_NORMALS.subarray(0, 2 * n)) };
    EXTRUSION_NORMALS.set(key, block);
  }
  if (block.a0 === w.a0 && block.a1 === w.a1) return block.data;
  const S = block.outline,
    D = block.data;
  const a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1;
  for (let i = 0; i < n; i++) {
    const sx = S[2 * i]!,
      sy = S[2 * i + 1]!;
    const x = sx * a0 + sy * b0,
      z = sx * a1 + sy * b1;
    // Point i is foot i and top i of side quad i, and foot j and top j of the quad before it; the
    // y of every side normal is 0 (the Float32Array's own).
    const k = 12 * i,
      before = 12 * (i > 0 ? i - 1 : n - 1);
    D[k] = x;
    D[k + 2] = z;
    D[k + 9] = x;
    D[k + 11] = z;
    D[before + 3] = x;
    D[before + 5] = z;
    D[before + 6] = x;
    D[before + 8] = z;
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

// A box's 24 vertices face by face, in the staged writer's order (its BOX_FACES): which of the
// eight placed corners each takes (bit 0 x1, bit 1 y1, bit 2 z1), and which of the box's ten uv
// numbers (BOX_UV_VALUES) its u and v are.
const BOX_VERTEX_CORNERS = new Uint8Array(24);
const BOX_VERTEX_UVS = new Uint8Array(48);
for (let f = 0; f < 6; f++)
  for (let c = 0; c < 4; c++) {
    const v = 4 * f + c;
    const xb = BOX_FACES[15 * f + 3 + 3 * c]!,
      yb = BOX_FACES[15 * f + 4 + 3 * c]!,
      zb = BOX_FACES[15 * f + 5 + 3 * c]!;
    BOX_VERTEX_CORNERS[v] = xb | (yb << 1) | (zb << 2);
    // Sides: u is x or y signed as BOX_U says, v the height; the top and underside take x and y.
    const alongY = f < 4 && BOX_U[2 * f] !== 0;
    const negative = f < 4 && BOX_U[2 * f + 1]! < 0;
    BOX_VERTEX_UVS[2 * v] = (alongY ? 4 : 0) + (negative ? 2 : 0) + (alongY ? yb : xb);
    BOX_VERTEX_UVS[2 * v + 1] = f < 4 ? 8 + zb : 4 + yb;
  }
// One box's placed corners (x, y, z scene metres, by corner as above) and its uv numbers: x0, x1,
// −x0, −x1, y0, y1, −y0, −y1 (plan metres) and z0, z1 (metres up).
const BOX_CORNER_POSITIONS = new Float64Array(24);
const BOX_UV_VALUES = new Float64Array(10);

/** A box part: its faces front, back, right, left, top and underside, as the staged writer orders them. */
function writeBox(w: SlotWriter, part: Part): void {
  const hw = part.w / 2,
    hd = part.d / 2;
  const x0 = part.x - hw,
    x1 = part.x + hw,
    y0 = part.y - hd,
    y1 = part.y + hd,
    z0 = part.z,
    z1 = z0 + part.h;
  // Only the extents enter a box's numbers: they are what must be in range.
  const inRange = ordinary(x0) && ordinary(x1) && ordinary(y0) && ordinary(y1) && ordinary(z0) && ordinary(z1);
  if (!(inRange && x1 - x0 >= THINNEST_BOX_MM && y1 - y0 >= THINNEST_BOX_MM && z1 - z0 >= THINNEST_BOX_MM)) {
    writePartStaged(w, part);
    return;
  }
  const cx = w.cx,
    cy = w.cy,
    a0 = w.a0,
    a1 = w.a1,
    b0 = w.b0,
    b1 = w.b1;
  // Each corner rounded to single precision in the piece frame, then placed (scene metres): the
  // sums (centre + x turned) + y turned, each part of them worked out once for the corners sharing it.
  const C = BOX_CORNER_POSITIONS;
  const sx0 = fround(x0),
    sx1 = fround(x1),
    sy0 = fround(y0),
    sy1 = fround(y1);
  const Y0 = (w.elevation + fround(z0)) * MM,
    Y1 = (w.elevation + fround(z1)) * MM;
  const ax0 = cx + sx0 * a0,
    ax1 = cx + sx1 * a0,
    az0 = cy + sx0 * a1,
    az1 = cy + sx1 * a1,
    bx0 = sy0 * b0,
    bx1 = sy1 * b0,
    bz0 = sy0 * b1,
    bz1 = sy1 * b1;
  for (let k = 0; k < 4; k++) {
    const X = ((k & 1 ? ax1 : ax0) + (k & 2 ? bx1 : bx0)) * MM,
      Z = ((k & 1 ? az1 : az0) + (k & 2 ? bz1 : bz0)) * MM;
    C[3 * k] = X;
    C[3 * k + 1] = Y0;
    C[3 * k + 2] = Z;
    C[3 * k + 12] = X;
    C[3 * k + 13] = Y1;
    C[3 * k + 14] = Z;
  }
  const U = BOX_UV_VALUES;
  U[0] = x0 * MM;
  U[1] = x1 * MM;
  U[2] = -U[0]!;
  U[3] = -U[1]!;
  U[4] = y0 * MM;
  U[5] = y1 * MM;
  U[6] = -U[4]!;
  U[7] = -U[5]!;
  U[8] = z0 * MM;
  U[9] = z1 * MM;
  const P = w.positions,
    T = w.uvs,
    first = w.count;
  const VC = BOX_VERTEX_CORNERS,
    VU = BOX_VERTEX_UVS;
  for (let v = 0; v < 24; v++) {
    const c = 3 * VC[v]!,
      p = 3 * (first + v),
      t = 2 * (first + v);
    P[p] = C[c]!;
    P[p + 1] = C[c + 1]!;
    P[p + 2] = C[c + 2]!;
    T[t] = U[VU[2 * v]!]!;
    T[t + 1] = U[VU[2 * v + 1]!]!;
  }
  w.normals.set(boxNormals(w), 3 * first);
  const I = w.indices,
    B = BOX_INDICES,
    c = w.indexCount;
  for (let k = 0; k < 36; k++) I[c + k] = first + B[k]!;
  w.count = first + 24;
  w.indexCount = c + 36;
}

/**
 * A rounded part, disc or leg the direct writer takes: numbers in range, a height, and every side
 * of its outline long against where it stands (its radius; its straight runs, or none at all as a
 * rounded end's; a leg's foot), so that each side triangle faces the way the same triangle of any
 * other such part faces.
 */
function wellShaped(part: Part): boolean {
  if (!ordinaryPart(part) || !(part.h >= THINNEST_BOX_MM)) return false;
  const least = SHORTEST_SIDE * (Math.abs(part.x) + Math.abs(part.y) + Math.abs(part.w) + Math.abs(part.d) + 1);
  if (part.shape === 'leg') {
    const taper = part.taper ?? 1;
    return taper >= LEAST_TAPER && taper <= 1 / LEAST_TAPER && part.w * Math.min(taper, 1) >= least;
  }
  const r = part.radius ?? 0;
  const hx = part.w / 2 - r,
    hy = part.d / 2 - r;
  // A radius past half a side folds the outline over itself.
  if (!(r >= least && hx >= 0 && hy >= 0)) return false;
  if (isDisc(part)) return true;
  return (hx === 0 || hx >= least) && (hy === 0 || hy >= least);
}

/** A side of an outline shorter than this share of where it stands (mm) goes to the staged writer. */
const SHORTEST_SIDE = 1e-6;
/** A leg's foot narrower or wider than this share of its top goes to the staged writer. */
const LEAST_TAPER = 1e-3;

// Outlines, for their normal blocks: rounded corners (by points), discs and legs (by sides).
const DISC_KEY = 1000;
const LEG_KEY = 2000;

/**
 * The scratch outline's `n` points as an upright prism from z0 to z1: side quads (foot i, foot j,
 * top j, top i), the top and the underside, the underside being the outline scaled by `scale`
 * about (ccx, ccy) (`plumb` when it is the outline itself: scale 1 about the frame's origin; a
 * well-shaped rounded part's outline has no −0 in it, the one number that scaling so would change).
 * Every side quad winds the same way: the staged writer's facing test on each of its triangles is
 * the height times the turn from an edge along the outline (the foot's or the top's) to the side's
 * outward normal, which on a well-shaped part is more than zero, or exactly zero on the no-length
 * runs of a rounded end (whose corners coincide), and zero takes the same way. The caps are fanned
 * from their first corner, and the staged writer's test on a fan's triangle is the turn between
 * its two edges, upwards for the top and downwards for the underside. A well-shaped outline is
 * convex and runs one way round, so that turn is more than zero, or exactly zero where two of the
 * triangle's corners coincide (a rounded end's no-length runs; its first and last corners when it
 * has no straight run across y and they round to the same point, else they are a hair apart and
 * the turn is a hair above zero): the top always takes the first way, the underside the first way
 * only where two corners coincide.
 */
function writeExtrusion(
  w: SlotWriter,
  n: number,
  normals: Float32Array,
  z0: number,
  z1: number,
  plumb: boolean,
  scale: number,
  ccx: number,
  ccy: number,
): void {
  const O = OUTLINE_POINTS;
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
  w.normals.set(normals, 3 * first);
  const v0 = z0 * MM,
    v1 = z1 * MM;
  const Y0 = (w.elevation + fround(z0)) * MM,
    Y1 = (w.elevation + fround(z1)) * MM;
  const top = first + 4 * n,
    bottom = first + 5 * n;
  const sides = w.indexCount,
    topFan = sides + 6 * n,
    bottomFan = topFan + 3 * (n - 2);
  // Point i is carried from the last step: its top (p) and foot (q) in the piece frame, and both placed.
  const p0x = O[0]!,
    p0y = O[1]!;
  let sx = fround(p0x),
    sy = fround(p0y);
  const TX0 = (cx + sx * a0 + sy * b0) * MM,
    TZ0 = (cy + sx * a1 + sy * b1) * MM;
  let q0x = p0x,
    q0y = p0y,
    BX0 = TX0,
    BZ0 = TZ0;
  if (!plumb) {
    q0x = ccx + (p0x - ccx) * scale;
    q0y = ccy + (p0y - ccy) * scale;
    sx = fround(q0x);
    sy = fround(q0y);
    BX0 = (cx + sx * a0 + sy * b0) * MM;
    BZ0 = (cy + sx * a1 + sy * b1) * MM;
  }
  let pix = p0x,
    piy = p0y,
    qix = q0x,
    qiy = q0y,
    TXi = TX0,
    TZi = TZ0,
    BXi = BX0,
    BZi = BZ0;
  let u = 0,
    u1 = 0 * MM;
  for (let i = 0; i < n; i++) {
    // The top's and the underside's corner i.
    let k = 3 * (top + i);
    P[k] = TXi;
    P[k + 1] = Y1;
    P[k + 2] = TZi;
    const tu = pix * MM,
      tv = piy * MM;
    k = 2 * (top + i);
    T[k] = tu;
    T[k + 1] = tv;
    k = 3 * (bottom + i);
    P[k] = BXi;
    P[k + 1] = Y0;
    P[k + 2] = BZi;
    k = 2 * (bottom + i);
    T[k] = plumb ? tu : qix * MM;
    T[k + 1] = plumb ? tv : qiy * MM;
    let pjx = p0x,
      pjy = p0y,
      qjx = q0x,
      qjy = q0y,
      TXj = TX0,
      TZj = TZ0,
      BXj = BX0,
      BZj = BZ0;
    if (i + 1 < n) {
      pjx = O[2 * i + 2]!;
      pjy = O[2 * i + 3]!;
      sx = fround(pjx);
      sy = fround(pjy);
      TXj = (cx + sx * a0 + sy * b0) * MM;
      TZj = (cy + sx * a1 + sy * b1) * MM;
      if (plumb) {
        qjx = pjx;
        qjy = pjy;
        BXj = TXj;
        BZj = TZj;
      } else {
        qjx = ccx + (pjx - ccx) * scale;
        qjy = ccy + (pjy - ccy) * scale;
        sx = fround(qjx);
        sy = fround(qjy);
        BXj = (cx + sx * a0 + sy * b0) * MM;
        BZj = (cy + sx * a1 + sy * b1) * MM;
      }
      // The caps' fan triangle (0, i, j), the top facing up and the underside down: see above.
      if (i > 0) {
        let f = topFan + 3 * (i - 1);
        I[f] = top;
        I[f + 1] = top + i + 1;
        I[f + 2] = top + i;
        const flat = (qjx === qix && qjy === qiy) || (qjx === q0x && qjy === q0y);
        f = bottomFan + 3 * (i - 1);
        I[f] = bottom;
        I[f + 1] = flat ? bottom + i + 1 : bottom + i;
        I[f + 2] = flat ? bottom + i : bottom + i + 1;
      }
    }
    // Side quad i: foot i, foot j, top j, top i; u along the outline, v up.
    const base = first + 4 * i;
    k = 3 * base;
    P[k] = BXi;
    P[k + 1] = Y0;
    P[k + 2] = BZi;
    P[k + 3] = BXj;
    P[k + 4] = Y0;
    P[k + 5] = BZj;
    P[k + 6] = TXj;
    P[k + 7] = Y1;
    P[k + 8] = TZj;
    P[k + 9] = TXi;
    P[k + 10] = Y1;
    P[k + 11] = TZi;
    const u0 = u1;
    u += hypot2(pjx - pix, pjy - piy);
    u1 = u * MM;
    k = 2 * base;
    T[k] = u0;
    T[k + 1] = v0;
    T[k + 2] = u1;
    T[k + 3] = v0;
    T[k + 4] = u1;
    T[k + 5] = v1;
    T[k + 6] = u0;
    T[k + 7] = v1;
    k = sides + 6 * i;
    I[k] = base;
    I[k + 1] = base + 2;
    I[k + 2] = base + 1;
    I[k + 3] = base;
    I[k + 4] = base + 3;
    I[k + 5] = base + 2;
    pix = pjx;
    piy = pjy;
    qix = qjx;
    qiy = qjy;
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
  if (part.shape === 'box' || part.shape === 'panel') {
    writeBox(w, part);
    return;
  }
  if (!wellShaped(part)) {
    writePartStaged(w, part);
    return;
  }
  const leg = part.shape === 'leg';
  const scale = leg ? (part.taper ?? 1) : 1,
    ccx = leg ? part.x : 0,
    ccy = leg ? part.y : 0;
  const n = leg ? legOutlineInto(part) : roundedOutlineInto(part);
  const key = leg ? LEG_KEY + n : isDisc(part) ? DISC_KEY + n : n;
  writeExtrusion(w, n, extrusionNormals(w, key, n), part.z, part.z + part.h, !leg, scale, ccx, ccy);
}
