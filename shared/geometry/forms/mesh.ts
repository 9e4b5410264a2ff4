// Parts (piece frame mm) as triangles in scene metres, one mesh per material slot, so a room's
// forms can be merged per material into a few draw calls. UVs are metres along each face, so a
// photo finish keeps its real repeat size on every part.
import type { MeshData } from '../scene';
import { directionDeg } from '../vec';
import type { MaterialSlot, Part } from './parts';
import { writePart } from './placed-parts';
import { EMPTY_MESH, legSides, roundedPoints, SlotWriter } from './slot-writer';

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
  /** Each part's slot: 0 main, 1 accent, 2 own. */
  slots: Uint8Array;
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
  const slots = new Uint8Array(parts.length);
  for (let p = 0; p < parts.length; p++) {
    const part = parts[p]!;
    const n = outlinePoints(part);
    const v = n === 0 ? 24 : 6 * n;
    const s = SLOT_INDEX[part.slot];
    slots[p] = s;
    vertices[s] += v;
    indices[s] += n === 0 ? 36 : 12 * n - 12;
    if (part.slot === 'own') ownColours.push({ colour: part.colour ?? '#ffffff', vertexCount: v });
  }
  let size = 0;
  for (let s = 0; s < 3; s++) size += 8 * vertices[s]! + indices[s]!;
  return { parts, slots, vertices, indices, ownColours, size };
}

/** One writer per material slot, reused by every form built on this thread. */
const WRITERS: readonly SlotWriter[] = [new SlotWriter(), new SlotWriter(), new SlotWriter()];

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
    WRITERS[s]!.begin(mesh, at.x, at.y, at.elevation, axis);
    meshes.push(mesh);
  }
  const { parts, slots } = plan;
  for (let p = 0; p < parts.length; p++) writePart(WRITERS[slots[p]!]!, parts[p]!);
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
