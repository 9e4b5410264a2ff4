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

type V3 = [number, number, number];

// Writes in the piece's own frame (mm). The piece frame (x, y, z up) maps to the scene (x, z, y
// up) through a mirror whatever the turn, so triangles are wound clockwise here to face outwards
// once placed.
class Writer {
  // Scratch buffers, grown by doubling and reused for every form (one writer per material slot):
  // a room's first build writes tens of thousands of numbers, and plain arrays made that mostly
  // garbage collection. Positions are kept in doubles so the facing test in fan() sees exactly
  // the values it always did; toMesh() copies out what was written.
  positions = new Float64Array(3 * 512);
  /** The same positions as they are stored (single precision), written alongside, so copying out is a plain copy. */
  stored = new Float32Array(3 * 512);
  normals = new Float32Array(3 * 512);
  uvs = new Float32Array(2 * 512);
  indices = new Uint32Array(3 * 512);
  count = 0;
  indexCount = 0;

  reset(): void {
    this.count = 0;
    this.indexCount = 0;
  }

  /** A flat or smoothly curved quad (corners in order round it) whose front faces `faceNormal`. */
  quad(p: readonly V3[], n: readonly V3[], uv: readonly [number, number][], faceNormal: V3): void {
    const base = this.count;
    for (let i = 0; i < p.length; i++) this.vertex(p[i]!, n[i]!, uv[i]![0], uv[i]![1]);
    this.fan(base, p.length, faceNormal);
  }

  /** A flat convex polygon facing `normal`. */
  polygon(p: readonly V3[], normal: V3): void {
    const base = this.count;
    for (const point of p) this.vertex(point, normal, point[0] * MM, point[1] * MM);
    this.fan(base, p.length, normal);
  }

  private vertex(p: V3, n: V3, u: number, v: number): void {
    this.raw(p[0], p[1], p[2], n[0], n[1], n[2], u, v);
  }

  /** One vertex from plain numbers: the extrusions write thousands, so no arrays are made for them. */
  raw(x: number, y: number, z: number, nx: number, ny: number, nz: number, u: number, v: number): void {
    const i = this.count;
    if ((i + 1) * 3 > this.positions.length) this.growVertices();
    const P = this.positions,
      N = this.normals,
      T = this.uvs;
    const S = this.stored;
    P[i * 3] = x;
    P[i * 3 + 1] = y;
    P[i * 3 + 2] = z;
    S[i * 3] = x;
    S[i * 3 + 1] = y;
    S[i * 3 + 2] = z;
    N[i * 3] = nx;
    N[i * 3 + 1] = ny;
    N[i * 3 + 2] = nz;
    T[i * 2] = u;
    T[i * 2 + 1] = v;
    this.count = i + 1;
  }

  private growVertices(): void {
    const grow = <T extends Float64Array | Float32Array>(a: T, make: (n: number) => T): T => {
      const b = make(a.length * 2);
      b.set(a);
      return b;
    };
    this.positions = grow(this.positions, (n) => new Float64Array(n));
    this.stored = grow(this.stored, (n) => new Float32Array(n));
    this.normals = grow(this.normals, (n) => new Float32Array(n));
    this.uvs = grow(this.uvs, (n) => new Float32Array(n));
  }

  private triangle(a: number, b: number, c: number): void {
    const k = this.indexCount;
    if (k + 3 > this.indices.length) {
      const more = new Uint32Array(this.indices.length * 2);
      more.set(this.indices);
      this.indices = more;
    }
    const I = this.indices;
    I[k] = a;
    I[k + 1] = b;
    I[k + 2] = c;
    this.indexCount = k + 3;
  }

  /** Triangles of a fan over the `n` vertices written from `base`, facing the normal f. */
  fan(base: number, n: number, f: V3): void {
    const P = this.positions;
    const ax = P[base * 3]!,
      ay = P[base * 3 + 1]!,
      az = P[base * 3 + 2]!;
    for (let k = 1; k + 1 < n; k++) {
      const b = base + k;
      const c = b + 1;
      const e1x = P[b * 3]! - ax,
        e1y = P[b * 3 + 1]! - ay,
        e1z = P[b * 3 + 2]! - az;
      const e2x = P[c * 3]! - ax,
        e2y = P[c * 3 + 1]! - ay,
        e2z = P[c * 3 + 2]! - az;
      const facing = (e1y * e2z - e1z * e2y) * f[0] + (e1z * e2x - e1x * e2z) * f[1] + (e1x * e2y - e1y * e2x) * f[2];
      if (facing >= 0) this.triangle(base, c, b);
      else this.triangle(base, b, c);
    }
  }

  /** Numbers toMesh copies out: 3 + 3 + 2 per vertex and one per triangle corner. */
  get size(): number {
    return 8 * this.count + this.indexCount;
  }

  /**
   * What was written, as a mesh of its own (the scratch buffers are reused), copied into `into`
   * from `at` (4-byte numbers): a form's slots share one buffer, as allocating buffers, not
   * copying numbers, is most of the cost of small meshes.
   */
  toMesh(into: ArrayBuffer, at: number): MeshData {
    const n = this.count;
    const positions = new Float32Array(into, at * 4, n * 3);
    const normals = new Float32Array(into, (at + n * 3) * 4, n * 3);
    const uvs = new Float32Array(into, (at + n * 6) * 4, n * 2);
    const indices = new Uint32Array(into, (at + n * 8) * 4, this.indexCount);
    positions.set(this.stored.subarray(0, n * 3));
    normals.set(this.normals.subarray(0, n * 3));
    uvs.set(this.uvs.subarray(0, n * 2));
    indices.set(this.indices.subarray(0, this.indexCount));
    return { positions, normals, uvs, indices };
  }
}

/**
 * Local forms are copied into shared blocks of this many 4-byte numbers, each form taking the
 * next free run: a room's forms need a few allocations, not one each. A block is freed once no
 * form in it is kept (the form cache is bounded).
 */
const BLOCK = 1 << 16;
let block = new ArrayBuffer(BLOCK * 4);
let blockUsed = 0;

/** A buffer and the offset (in 4-byte numbers) of `size` free numbers in it. */
function claim(size: number): [ArrayBuffer, number] {
  if (size > BLOCK / 4) return [new ArrayBuffer(size * 4), 0];
  if (blockUsed + size > BLOCK) {
    block = new ArrayBuffer(BLOCK * 4);
    blockUsed = 0;
  }
  const at = blockUsed;
  blockUsed += size;
  return [block, at];
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
const WRITERS: Record<MaterialSlot, Writer> = { main: new Writer(), accent: new Writer(), own: new Writer() };

interface Frame {
  cx: number;
  cy: number;
  ax: readonly [number, number];
  ay: readonly [number, number];
  elevation: number;
}

function frameOf(at: Placement): Frame {
  const ax = directionDeg(at.rotation);
  return { cx: at.x, cy: at.y, ax, ay: [-ax[1], ax[0]], elevation: at.elevation };
}

// The four sides, then the top and the underside, each a fan over its corners; written from plain
// numbers (no arrays per part), in the same order and with the same values as corner lists would give.
function writeBox(w: Writer, part: Part): void {
  const x0 = part.x - part.w / 2,
    x1 = part.x + part.w / 2;
  const y0 = part.y - part.d / 2,
    y1 = part.y + part.d / 2;
  const z0 = part.z,
    z1 = part.z + part.h;
  const v0 = z0 * MM,
    v1 = z1 * MM;
  let base = w.count;
  // Front (+y).
  w.raw(x0, y1, z0, 0, 1, 0, x0 * MM, v0);
  w.raw(x1, y1, z0, 0, 1, 0, x1 * MM, v0);
  w.raw(x1, y1, z1, 0, 1, 0, x1 * MM, v1);
  w.raw(x0, y1, z1, 0, 1, 0, x0 * MM, v1);
  w.fan(base, 4, PLUS_Y);
  // Back (−y).
  base = w.count;
  w.raw(x1, y0, z0, 0, -1, 0, -x1 * MM, v0);
  w.raw(x0, y0, z0, 0, -1, 0, -x0 * MM, v0);
  w.raw(x0, y0, z1, 0, -1, 0, -x0 * MM, v1);
  w.raw(x1, y0, z1, 0, -1, 0, -x1 * MM, v1);
  w.fan(base, 4, MINUS_Y);
  // Right (+x).
  base = w.count;
  w.raw(x1, y1, z0, 1, 0, 0, -y1 * MM, v0);
  w.raw(x1, y0, z0, 1, 0, 0, -y0 * MM, v0);
  w.raw(x1, y0, z1, 1, 0, 0, -y0 * MM, v1);
  w.raw(x1, y1, z1, 1, 0, 0, -y1 * MM, v1);
  w.fan(base, 4, PLUS_X);
  // Left (−x).
  base = w.count;
  w.raw(x0, y0, z0, -1, 0, 0, y0 * MM, v0);
  w.raw(x0, y1, z0, -1, 0, 0, y1 * MM, v0);
  w.raw(x0, y1, z1, -1, 0, 0, y1 * MM, v1);
  w.raw(x0, y0, z1, -1, 0, 0, y0 * MM, v1);
  w.fan(base, 4, MINUS_X);
  // Top and underside: uvs are the plan position in metres.
  base = w.count;
  w.raw(x0, y0, z1, 0, 0, 1, x0 * MM, y0 * MM);
  w.raw(x1, y0, z1, 0, 0, 1, x1 * MM, y0 * MM);
  w.raw(x1, y1, z1, 0, 0, 1, x1 * MM, y1 * MM);
  w.raw(x0, y1, z1, 0, 0, 1, x0 * MM, y1 * MM);
  w.fan(base, 4, PLUS_Z);
  base = w.count;
  w.raw(x0, y0, z0, 0, 0, -1, x0 * MM, y0 * MM);
  w.raw(x1, y0, z0, 0, 0, -1, x1 * MM, y0 * MM);
  w.raw(x1, y1, z0, 0, 0, -1, x1 * MM, y1 * MM);
  w.raw(x0, y1, z0, 0, 0, -1, x0 * MM, y1 * MM);
  w.fan(base, 4, MINUS_Z);
}

const PLUS_X: V3 = [1, 0, 0];
const MINUS_X: V3 = [-1, 0, 0];
const PLUS_Y: V3 = [0, 1, 0];
const MINUS_Y: V3 = [0, -1, 0];
const PLUS_Z: V3 = [0, 0, 1];
const MINUS_Z: V3 = [0, 0, -1];

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
  const sides = part.w > WIDE_LEG_MM ? WIDE_LEG_SIDES : LEG_SIDES;
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

const EXTRUSION_FACE: V3 = [0, 0, 0];

// The scratch outline's `n` points as an upright prism from z0 to z1: its sides (smooth normals
// round it, u running along the outline), its top and its underside. The underside is the
// outline scaled by `bottomScale` about (cx, cy).
function writeExtrusion(w: Writer, n: number, z0: number, z1: number, bottomScale: number, cx: number, cy: number): void {
  const P = OUTLINE_POINTS,
    N = OUTLINE_NORMALS;
  const face = EXTRUSION_FACE;
  face[2] = 0;
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
    const base = w.count;
    w.raw(cx + (pix - cx) * bottomScale, cy + (piy - cy) * bottomScale, z0, nix, niy, 0, u * MM, z0 * MM);
    w.raw(cx + (pjx - cx) * bottomScale, cy + (pjy - cy) * bottomScale, z0, njx, njy, 0, (u + step) * MM, z0 * MM);
    w.raw(pjx, pjy, z1, njx, njy, 0, (u + step) * MM, z1 * MM);
    w.raw(pix, piy, z1, nix, niy, 0, u * MM, z1 * MM);
    face[0] = (nix + njx) / 2;
    face[1] = (niy + njy) / 2;
    w.fan(base, 4, face);
    u += step;
  }
  let base = w.count;
  for (let i = 0; i < n; i++) {
    const px = P[2 * i]!,
      py = P[2 * i + 1]!;
    w.raw(px, py, z1, 0, 0, 1, px * MM, py * MM);
  }
  w.fan(base, n, PLUS_Z);
  base = w.count;
  for (let i = 0; i < n; i++) {
    const bx = cx + (P[2 * i]! - cx) * bottomScale,
      by = cy + (P[2 * i + 1]! - cy) * bottomScale;
    w.raw(bx, by, z0, 0, 0, -1, bx * MM, by * MM);
  }
  w.fan(base, n, MINUS_Z);
}

function writeRounded(w: Writer, part: Part): void {
  writeExtrusion(w, roundedOutlineInto(part), part.z, part.z + part.h, 1, 0, 0);
}

function writeLeg(w: Writer, part: Part): void {
  writeExtrusion(w, legOutlineInto(part), part.z, part.z + part.h, part.taper ?? 1, part.x, part.y);
}

function writePart(w: Writer, part: Part): void {
  if (part.shape === 'rounded') writeRounded(w, part);
  else if (part.shape === 'leg') writeLeg(w, part);
  else writeBox(w, part);
}

/** A piece's parts in its own frame (mm, z up), one mesh per material slot; placeForm puts them in the room. */
export function localFormMeshes(parts: readonly Part[]): FormMeshes {
  const writers = WRITERS;
  writers.main.reset();
  writers.accent.reset();
  writers.own.reset();
  const ownColours: ColourRun[] = [];
  for (const part of parts) {
    const writer = writers[part.slot];
    const before = writer.count;
    writePart(writer, part);
    if (part.slot === 'own') ownColours.push({ colour: part.colour ?? '#ffffff', vertexCount: writer.count - before });
  }
  const mainSize = writers.main.size,
    accentSize = writers.accent.size;
  const [buffer, at] = claim(mainSize + accentSize + writers.own.size);
  return {
    main: writers.main.toMesh(buffer, at),
    accent: writers.accent.toMesh(buffer, at + mainSize),
    own: writers.own.toMesh(buffer, at + mainSize + accentSize),
    ownColours,
  };
}

// Writes `mesh` placed by `f` into `out` from `at` (positions, then normals) and returns it with
// the local uvs and triangles, which do not change with where the piece stands (shared, never
// written to).
function placeMesh(mesh: MeshData, f: Frame, out: Float32Array, at: number): MeshData {
  const n = mesh.positions.length;
  const positions = out.subarray(at, at + n);
  const normals = out.subarray(at + n, at + 2 * n);
  const p = mesh.positions;
  const q = mesh.normals;
  const [a0, a1] = f.ax;
  const [b0, b1] = f.ay;
  for (let i = 0; i < n; i += 3) {
    positions[i] = (f.cx + p[i]! * a0 + p[i + 1]! * b0) * MM;
    positions[i + 1] = (f.elevation + p[i + 2]!) * MM;
    positions[i + 2] = (f.cy + p[i]! * a1 + p[i + 1]! * b1) * MM;
    normals[i] = q[i]! * a0 + q[i + 1]! * b0;
    normals[i + 1] = q[i + 2]!;
    normals[i + 2] = q[i]! * a1 + q[i + 1]! * b1;
  }
  return { positions, normals, uvs: mesh.uvs, indices: mesh.indices };
}

/** Numbers placeForm writes for a form: positions and normals of every slot. */
export function placedSize(local: FormMeshes): number {
  return 2 * (local.main.positions.length + local.accent.positions.length + local.own.positions.length);
}

/**
 * A piece's form in its own frame placed in the room: scene metres, y up. Written into `out` from
 * `at` (placedSize(local) numbers) when given, so a room's forms can share one buffer.
 */
export function placeForm(local: FormMeshes, at: Placement, out?: Float32Array, offset = 0): FormMeshes {
  const frame = frameOf(at);
  const into = out ?? new Float32Array(placedSize(local));
  const start = out ? offset : 0;
  const main = 2 * local.main.positions.length;
  const accent = 2 * local.accent.positions.length;
  return {
    main: placeMesh(local.main, frame, into, start),
    accent: placeMesh(local.accent, frame, into, start + main),
    own: placeMesh(local.own, frame, into, start + main + accent),
    ownColours: local.ownColours,
  };
}

/** A piece's parts placed in the room, scene metres, one mesh per material slot. */
export function formMeshes(parts: readonly Part[], at: Placement): FormMeshes {
  return placeForm(localFormMeshes(parts), at);
}
/** Triangles a form draws, over all its slots. */
export function formTriangles(meshes: FormMeshes): number {
  return (meshes.main.indices.length + meshes.accent.indices.length + meshes.own.indices.length) / 3;
}
