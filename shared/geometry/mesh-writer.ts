// The scene mesh writer: one surface as plain typed arrays in scene metres, written as quads,
// flat polygons and boxes whose triangles always face their normals; shared by every scene builder.
import { boxCornersMm, planBoxAt, type PiecePlanBox } from './piece';
import { triangulatePolygon } from './polygon';
import type { Vec2 } from './vec';

export const MM_TO_M = 1 / 1000;

/** One surface as indexed triangles in scene metres; uvs are metres so a finish repeats at its true size. */
export interface MeshData {
  positions: Float32Array;
  normals: Float32Array;
  uvs: Float32Array;
  indices: Uint32Array;
}

export type Vec3 = readonly [number, number, number];

// Collects vertices as plain numbers and converts once; quads and polygons choose their triangle
// order from the requested normal, so front faces always face the normal (CCW seen from there).
export class MeshWriter {
  private positions: number[] = [];
  private normals: number[] = [];
  private uvs: number[] = [];
  private indices: number[] = [];
  private count = 0;

  private vertex(p: Vec3, n: Vec3, u: number, v: number): void {
    this.positions.push(p[0], p[1], p[2]);
    this.normals.push(n[0], n[1], n[2]);
    this.uvs.push(u, v);
    this.count++;
  }

  private triangle(base: number, a: number, b: number, c: number, points: readonly Vec3[], n: Vec3): void {
    const pa = points[a]!;
    const pb = points[b]!;
    const pc = points[c]!;
    const e1x = pb[0] - pa[0],
      e1y = pb[1] - pa[1],
      e1z = pb[2] - pa[2];
    const e2x = pc[0] - pa[0],
      e2y = pc[1] - pa[1],
      e2z = pc[2] - pa[2];
    const facing = (e1y * e2z - e1z * e2y) * n[0] + (e1z * e2x - e1x * e2z) * n[1] + (e1x * e2y - e1y * e2x) * n[2];
    if (facing >= 0) this.indices.push(base + a, base + b, base + c);
    else this.indices.push(base + a, base + c, base + b);
  }

  /** A flat polygon given as scene points with their uvs and a triangulation of it. */
  polygon(points: readonly Vec3[], uvs: readonly (readonly [number, number])[], triangles: readonly number[], n: Vec3): void {
    const base = this.count;
    for (let i = 0; i < points.length; i++) this.vertex(points[i]!, n, uvs[i]![0], uvs[i]![1]);
    for (let k = 0; k + 2 < triangles.length; k += 3)
      this.triangle(base, triangles[k]!, triangles[k + 1]!, triangles[k + 2]!, points, n);
  }

  /** A flat convex quad, corners in order round it. */
  quad(points: readonly [Vec3, Vec3, Vec3, Vec3], uvs: readonly (readonly [number, number])[], n: Vec3): void {
    this.polygon(points, uvs, QUAD_TRIANGLES, n);
  }

  toMesh(): MeshData {
    return meshFromArrays(this.positions, this.normals, this.uvs, this.indices);
  }
}

/** Plain number lists (scene metres) as a mesh's typed arrays. */
export function meshFromArrays(
  positions: readonly number[],
  normals: readonly number[],
  uvs: readonly number[],
  indices: readonly number[],
): MeshData {
  return {
    positions: new Float32Array(positions),
    normals: new Float32Array(normals),
    uvs: new Float32Array(uvs),
    indices: new Uint32Array(indices),
  };
}

const QUAD_TRIANGLES = [0, 1, 2, 0, 2, 3];
export const UP: Vec3 = [0, 1, 0];
export const DOWN: Vec3 = [0, -1, 0];

/** Plan point (mm) at height (mm) as a scene point (m). */
export function planToScene(point: Vec2, heightMm: number): [number, number, number] {
  return [point[0] * MM_TO_M, heightMm * MM_TO_M, point[1] * MM_TO_M];
}

export function sceneDirection(planDirection: Vec2): Vec3 {
  return [planDirection[0], 0, planDirection[1]];
}

// A horizontal plan polygon at one height; uvs are the plan position in metres.
export function writeCap(writer: MeshWriter, points: readonly Vec2[], heightMm: number, normal: Vec3): void {
  const triangles = triangulatePolygon(points);
  writer.polygon(
    points.map((p) => planToScene(p, heightMm)),
    points.map((p) => [p[0] * MM_TO_M, p[1] * MM_TO_M] as const),
    triangles,
    normal,
  );
}

/** A box's faces: its two broad sides (across its own y), its two narrow ends (across its own x), top and bottom. */
export type BoxFace = 'side' | 'end' | 'top' | 'bottom';

/** A box standing on its footprint from bottomMm up by heightMm, every face into one writer. */
export function writeBox(writer: MeshWriter, box: PiecePlanBox, bottomMm: number, heightMm: number): void {
  writeBoxFaces(() => writer, box, bottomMm, heightMm);
}

// A box standing on its footprint (geometry/piece) from bottomMm up by heightMm; its own y is its
// own x turned 90° clockwise on the plan. Heights in mm; uvs in metres along each face. Each face
// goes to the writer `writerFor` names, or is left out where it names none (a face no one sees).
export function writeBoxFaces(
  writerFor: (face: BoxFace) => MeshWriter | null,
  box: PiecePlanBox,
  bottomMm: number,
  heightMm: number,
): void {
  const { axisX, axisY } = box;
  const sizeXMm = box.halfWidthMm * 2;
  const sizeYMm = box.halfDepthMm * 2;
  const topMm = bottomMm + heightMm;
  // Footprint corners in order round the box: (−x,−y) (+x,−y) (+x,+y) (−x,+y).
  const [f0, f1, f2, f3] = boxCornersMm(box);
  const foot: [Vec2, Vec2, Vec2, Vec2] = [f0!, f1!, f2!, f3!];
  const sides: [0 | 1 | 2 | 3, 0 | 1 | 2 | 3, Vec2, number, BoxFace][] = [
    [0, 1, [-axisY[0], -axisY[1]], sizeXMm, 'side'],
    [1, 2, axisX, sizeYMm, 'end'],
    [2, 3, axisY, sizeXMm, 'side'],
    [3, 0, [-axisX[0], -axisX[1]], sizeYMm, 'end'],
  ];
  const vb = 0;
  const vt = heightMm * MM_TO_M;
  for (const [a, b, outward, widthMm, face] of sides) {
    const writer = writerFor(face);
    if (!writer) continue;
    const w = widthMm * MM_TO_M;
    writer.quad(
      [planToScene(foot[a], bottomMm), planToScene(foot[b], bottomMm), planToScene(foot[b], topMm), planToScene(foot[a], topMm)],
      [
        [0, vb],
        [w, vb],
        [w, vt],
        [0, vt],
      ],
      sceneDirection(outward),
    );
  }
  const x = sizeXMm * MM_TO_M;
  const y = sizeYMm * MM_TO_M;
  const capUvs = [
    [0, 0],
    [x, 0],
    [x, y],
    [0, y],
  ] as const;
  writerFor('top')?.quad(
    [planToScene(foot[0], topMm), planToScene(foot[1], topMm), planToScene(foot[2], topMm), planToScene(foot[3], topMm)],
    capUvs,
    UP,
  );
  writerFor('bottom')?.quad(
    [
      planToScene(foot[0], bottomMm),
      planToScene(foot[1], bottomMm),
      planToScene(foot[2], bottomMm),
      planToScene(foot[3], bottomMm),
    ],
    capUvs,
    DOWN,
  );
}

/**
 * A box lined up with a wall-like frame (plan mm): from `fromAlong` to `toAlong` along `along` and
 * from `fromAcross` to `toAcross` along `across` (square to it), measured from `origin`.
 */
export function alignedBox(
  origin: Vec2,
  along: Vec2,
  across: Vec2,
  fromAlong: number,
  toAlong: number,
  fromAcross: number,
  toAcross: number,
): PiecePlanBox {
  const a = (fromAlong + toAlong) / 2;
  const c = (fromAcross + toAcross) / 2;
  const centre: Vec2 = [origin[0] + along[0] * a + across[0] * c, origin[1] + along[1] * a + across[1] * c];
  return planBoxAt(centre, along, Math.abs(toAlong - fromAlong), Math.abs(toAcross - fromAcross));
}
