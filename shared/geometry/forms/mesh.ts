// Parts (piece frame mm) as triangles in scene metres, one mesh per material slot, so a room's
// forms can be merged per material into a few draw calls. UVs are metres along each face, so a
// photo finish keeps its real repeat size on every part.
import type { MeshData } from '../scene';
import { directionDeg } from '../vec';
import type { MaterialSlot, Part } from './parts';

const MM = 1 / 1000;
/** Segments per quarter of a rounded corner (a disc gets four of them). */
const CORNER_SEGMENTS = 3;
const DISC_SEGMENTS = 5;
/** Sides round a leg: slim legs need few, lamp shades and pots more. */
const LEG_SIDES = 8;
const WIDE_LEG_SIDES = 14;
const WIDE_LEG_MM = 120;

/** Where a piece stands: centre (plan mm), turn (degrees clockwise seen from above), underside above the floor (mm). */
export interface Placement {
  x: number;
  y: number;
  rotation: number;
  elevation: number;
}

/** One colour run of the own-coloured mesh: `vertexCount` vertices in a row wear `colour`. */
export interface ColourRun {
  colour: string;
  vertexCount: number;
}

/** A piece's form in scene metres, one mesh per material slot; the own mesh lists which colour each run of vertices wears. */
export interface FormMeshes {
  main: MeshData;
  accent: MeshData;
  own: MeshData;
  ownColours: ColourRun[];
}

const SLOT_INDEX: Record<MaterialSlot, 0 | 1 | 2> = { main: 0, accent: 1, own: 2 };

/** Points round a rounded part's outline: a disc when both straight runs vanish. */
function roundedPoints(part: Part): number {
  const r = part.radius ?? 0;
  const disc = part.w / 2 - r < 1e-6 && part.d / 2 - r < 1e-6;
  return disc ? 4 * DISC_SEGMENTS : 4 * (CORNER_SEGMENTS + 1);
}

const legSides = (part: Part) => (part.w > WIDE_LEG_MM ? WIDE_LEG_SIDES : LEG_SIDES);

/** Outline points of an upright prism (rounded parts and legs); 0 for plain boxes and panels. */
function outlinePoints(part: Part): number {
  return part.shape === 'rounded' ? roundedPoints(part) : part.shape === 'leg' ? legSides(part) : 0;
}

/**
 * A form's parts with how many vertices and triangle corners each slot takes (worked out from the
 * parts alone: a box is six quads, a prism of n points n side quads and two n-gon caps), so the
 * meshes can be written once, straight into buffers of the right size.
 */
export interface FormPlan {
  parts: readonly Part[];
  /** By slot: main, accent, own. */
  vertices: [number, number, number];
  indices: [number, number, number];
  ownColours: ColourRun[];
  /** 4-byte numbers the placed meshes take: positions, normals, uvs and indices of every slot. */
  size: number;
}

export function planForm(parts: readonly Part[]): FormPlan {
  const vertices: [number, number, number] = [0, 0, 0];
  const indices: [number, number, number] = [0, 0, 0];
  const ownColours: ColourRun[] = [];
  for (const part of parts) {
    const n = outlinePoints(part);
    const v = n === 0 ? 24 : 6 * n;
    const s = SLOT_INDEX[part.slot];
    vertices[s] += v;
    indices[s] += n === 0 ? 36 : 12 * n - 12;
    if (part.slot === 'own') ownColours.push({ colour: part.colour ?? '#ffffff', vertexCount: v });
  }
  let size = 0;
  for (let s = 0; s < 3; s++) size += 8 * vertices[s]! + indices[s]!;
  return { parts, vertices, indices, ownColours, size };
}

/** Shared by every slot that has no parts (nothing is ever written to a mesh once made). */
const EMPTY_MESH: MeshData = {
  positions: new Float32Array(0),
  normals: new Float32Array(0),
  uvs: new Float32Array(0),
  indices: new Uint32Array(0),
};

/** A part has at most this many vertices (a disc's prism: 20 side quads and two caps) and polygons. */
const MAX_PART_VERTICES = 6 * 4 * DISC_SEGMENTS;
const MAX_PART_POLYGONS = 4 * DISC_SEGMENTS + 2;

// One part's vertices in the piece's own frame (mm, doubles), eight numbers each: position,
// normal, uv; and its polygons, four numbers each: corner count and the normal it faces. A part
// fills them with plain stores, then emit() places them all in one loop: calls with many numbers
// would box every number on the heap, which made most of a room's first build garbage.
const VERTS = new Float64Array(8 * MAX_PART_VERTICES);
const POLYS = new Float64Array(4 * MAX_PART_POLYGONS);

// Writes one slot of a form straight in its placed place: each vertex is rounded to single
// precision as it is stored, then turned, moved and scaled to scene metres, so the numbers are
// those of storing the form first and placing it afterwards. The piece frame (x, y, z up) maps to
// the scene (x, z, y up) through a mirror whatever the turn, so triangles are wound clockwise
// here to face outwards once placed.
class Writer {
  positions = EMPTY_MESH.positions;
  normals = EMPTY_MESH.normals;
  uvs = EMPTY_MESH.uvs;
  indices = EMPTY_MESH.indices;
  count = 0;
  indexCount = 0;
  // Where the piece stands: centre (mm), its own x and y axes on the plan, underside (mm).
  cx = 0.5;
  cy = 0.5;
  a0 = 0.5;
  a1 = 0.5;
  b0 = 0.5;
  b1 = 0.5;
  elevation = 0.5;

  /** Points the writer at `mesh` (sized by the plan), placed by `at` turned to `axis`. */
  begin(mesh: MeshData, at: Placement, axis: readonly [number, number]): void {
    this.positions = mesh.positions;
    this.normals = mesh.normals;
    this.uvs = mesh.uvs;
    this.indices = mesh.indices;
    this.count = 0;
    this.indexCount = 0;
    this.cx = at.x;
    this.cy = at.y;
    this.a0 = axis[0];
    this.a1 = axis[1];
    this.b0 = -axis[1];
    this.b1 = axis[0];
    this.elevation = at.elevation;
  }

  /** Places the part in VERTS (`vertices` of them) and fans each of its `polygons` in POLYS, in order. */
  emit(vertices: number, polygons: number): void {
    const V = VERTS,
      F = POLYS;
    const P = this.positions,
      N = this.normals,
      T = this.uvs,
      I = this.indices;
    const cx = this.cx,
      cy = this.cy,
      a0 = this.a0,
      a1 = this.a1,
      b0 = this.b0,
      b1 = this.b1,
      elevation = this.elevation;
    const first = this.count;
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
    this.count = first + vertices;
    // Each polygon a fan from its first corner, each triangle wound by the facing test on the
    // unrounded positions.
    let at = 0;
    let c = this.indexCount;
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
    this.indexCount = c;
  }
}

/**
 * The length of (dx, dy) with the same steps as V8's Math.hypot (each side scaled by the larger,
 * squares summed; for two numbers its compensated sum reduces to this): the same number, without
 * a call that gathers its arguments.
 */
function hypot2(dx: number, dy: number): number {
  const a = Math.abs(dx),
    b = Math.abs(dy);
  const max = a > b ? a : b;
  if (max === Infinity) return Infinity;
  if (max !== max) return NaN;
  if (max === 0) return 0;
  const n0 = a / max,
    n1 = b / max;
  return Math.sqrt(n0 * n0 + n1 * n1) * max;
}

/** One writer per material slot, reused by every form built on this thread. */
const WRITERS: readonly Writer[] = [new Writer(), new Writer(), new Writer()];

// A box's six faces in order (front +y, back −y, right +x, left −x, top, underside): the normal
// each faces, then its four corners in order round it as which of x0/x1, y0/y1, z0/z1 they take.
// Sides run u along the face (the coordinate and sign in BOX_U) and v up; the top and underside
// take the plan position in metres.
// prettier-ignore
const BOX_FACES = new Int8Array([
  0, 1, 0, /* corners */ 0, 1, 0, 1, 1, 0, 1, 1, 1, 0, 1, 1,
  0, -1, 0, /* corners */ 1, 0, 0, 0, 0, 0, 0, 0, 1, 1, 0, 1,
  1, 0, 0, /* corners */ 1, 1, 0, 1, 0, 0, 1, 0, 1, 1, 1, 1,
  -1, 0, 0, /* corners */ 0, 0, 0, 0, 1, 0, 0, 1, 1, 0, 0, 1,
  0, 0, 1, /* corners */ 0, 0, 1, 1, 0, 1, 1, 1, 1, 0, 1, 1,
  0, 0, -1, /* corners */ 0, 0, 0, 1, 0, 0, 1, 1, 0, 0, 1, 0,
]);
/** For each side face, u is this plan coordinate (0 x, 1 y) times this sign. */
// prettier-ignore
const BOX_U = new Int8Array([0, 1, 0, -1, 1, -1, 1, 1]);
/** The box's extents, x0 x1 y0 y1 z0 z1, for the corners to pick from. */
const BOX_EXTENTS = new Float64Array(6);

function writeBox(w: Writer, part: Part): void {
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
  w.emit(24, 6);
}

// An outline round a part, written into scratch arrays (x, y pairs) reused for every part.
const OUTLINE_POINTS = new Float64Array(2 * 64);
const OUTLINE_NORMALS = new Float64Array(2 * 64);

// Cosines and sines of the outline angles, worked out once with the same expressions the outlines
// use (so every number is the same), by segments per quarter or sides round a leg.
const CORNER_TURNS = new Map<number, { cos: Float64Array; sin: Float64Array }>();
const LEG_TURNS = new Map<number, { cos: Float64Array; sin: Float64Array }>();

function cornerTurns(segments: number): { cos: Float64Array; sin: Float64Array } {
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

function legTurns(sides: number): { cos: Float64Array; sin: Float64Array } {
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

/** Writes a rounded part's plan outline into the scratch arrays; returns how many points. */
function roundedOutlineInto(part: Part): number {
  const r = part.radius ?? 0;
  const hx = part.w / 2 - r;
  const hy = part.d / 2 - r;
  const disc = hx < 1e-6 && hy < 1e-6;
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

/** Writes a leg's outline at its top into the scratch arrays; returns how many points. */
function legOutlineInto(part: Part): number {
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

/** The scratch outline's first `n` points and normals as pairs. */
function outlinePairs(n: number): { points: [number, number][]; normals: [number, number][] } {
  const points: [number, number][] = [];
  const normals: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    points.push([OUTLINE_POINTS[2 * i]!, OUTLINE_POINTS[2 * i + 1]!]);
    normals.push([OUTLINE_NORMALS[2 * i]!, OUTLINE_NORMALS[2 * i + 1]!]);
  }
  return { points, normals };
}

/** The plan outline of a rounded part (piece frame mm), corner by corner, with each point's outward normal. */
export function roundedOutline(part: Part): { points: [number, number][]; normals: [number, number][] } {
  return outlinePairs(roundedOutlineInto(part));
}

/** A leg's outline at its top (piece frame mm), round it. */
export function legOutline(part: Part): { points: [number, number][]; normals: [number, number][] } {
  return outlinePairs(legOutlineInto(part));
}

// The scratch outline's `n` points as an upright prism from z0 to z1: its sides (smooth normals
// round it, u running along the outline), its top and its underside. The underside is the
// outline scaled by `bottomScale` about (cx, cy).
function writeExtrusion(w: Writer, n: number, z0: number, z1: number, bottomScale: number, cx: number, cy: number): void {
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
  w.emit(6 * n, n + 2);
}

function writePart(w: Writer, part: Part): void {
  if (part.shape === 'rounded') writeExtrusion(w, roundedOutlineInto(part), part.z, part.z + part.h, 1, 0, 0);
  else if (part.shape === 'leg')
    writeExtrusion(w, legOutlineInto(part), part.z, part.z + part.h, part.taper ?? 1, part.x, part.y);
  else writeBox(w, part);
}

/** A mesh of `vertices` vertices and `indices` triangle corners laid in `buffer` from `at` (4-byte numbers). */
function meshIn(buffer: ArrayBuffer, at: number, vertices: number, indices: number): MeshData {
  if (indices === 0) return EMPTY_MESH;
  return {
    positions: new Float32Array(buffer, at * 4, vertices * 3),
    normals: new Float32Array(buffer, (at + vertices * 3) * 4, vertices * 3),
    uvs: new Float32Array(buffer, (at + vertices * 6) * 4, vertices * 2),
    indices: new Uint32Array(buffer, (at + vertices * 8) * 4, indices),
  };
}

/**
 * A piece's form placed in the room (scene metres, y up), every vertex written once straight into
 * `buffer` from `at` (plan.size 4-byte numbers), so a room's forms can share one buffer.
 */
export function writeForm(plan: FormPlan, at: Placement, buffer: ArrayBuffer, offset: number): FormMeshes {
  const meshes: MeshData[] = [];
  const axis = directionDeg(at.rotation);
  let o = offset;
  for (let s = 0; s < 3; s++) {
    const v = plan.vertices[s]!,
      i = plan.indices[s]!;
    const mesh = meshIn(buffer, o, v, i);
    o += 8 * v + i;
    WRITERS[s]!.begin(mesh, at, axis);
    meshes.push(mesh);
  }
  for (const part of plan.parts) writePart(WRITERS[SLOT_INDEX[part.slot]]!, part);
  return { main: meshes[0]!, accent: meshes[1]!, own: meshes[2]!, ownColours: plan.ownColours };
}

/** A piece's parts placed in the room, scene metres, one mesh per material slot. */
export function formMeshes(parts: readonly Part[], at: Placement): FormMeshes {
  const plan = planForm(parts);
  return writeForm(plan, at, new ArrayBuffer(plan.size * 4), 0);
}

/** Triangles a form draws, over all its slots. */
export function formTriangles(meshes: FormMeshes): number {
  return (meshes.main.indices.length + meshes.accent.indices.length + meshes.own.indices.length) / 3;
}
