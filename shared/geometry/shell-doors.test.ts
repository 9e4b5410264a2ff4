// Tests for doors and passages in the 3D shell: the leaf open by DOOR_OPEN_ANGLE_DEG with its edges
// and a lever on each face at handle height, the lining through the wall's thickness and the
// architraves on both faces, and passages lined without a leaf. Numbers, not pictures.
import { describe, expect, it } from 'vitest';
import { designExampleRoom } from '../../tests/reference/rooms';
import { roomShellSchema } from '../schemas/room';
import { buildShellScene, meshBounds } from './scene';
import { DOOR_OPEN_ANGLE_DEG, doorSwing } from './openings';
import {
  ARCHITRAVE_THICKNESS_MM,
  ARCHITRAVE_WIDTH_MM,
  DOOR_LEAF_THICKNESS_MM,
  HANDLE_HEIGHT_MM,
  LINING_THICKNESS_MM,
  buildDoorLeaf,
} from './shell-doors';
import { layoutShellWalls } from './walls';
import type { Door } from '../schemas/room';

// The example: door d1 on wall 0 (plan y 0, the wall 100 mm thick out to y −100) at x 300–1120,
// 2040 high, hinged at its start and swinging in; passage p1 on wall 3 (x 0 to −100) at y 2800–1900.
const example = roomShellSchema.parse(designExampleRoom);
const door = example.openings.find((o): o is Door => o.type === 'door')!;
const walls = layoutShellWalls(example);
const mm = (m: number) => m * 1000;

describe('buildDoorLeaf', () => {
  const leaf = buildDoorLeaf(walls[0], door);

  it('stands the leaf open on its hinge at the one open angle, edges with it', () => {
    const swing = doorSwing(walls[0], door);
    expect(Math.abs(swing.sweepDeg)).toBe(DOOR_OPEN_ANGLE_DEG);
    const faces = meshBounds(leaf.mesh);
    const edges = meshBounds(leaf.edges);
    for (const b of [faces, edges]) {
      expect(mm(b.min[0])).toBeCloseTo(300, 3);
      expect(mm(b.max[0])).toBeCloseTo(300 + DOOR_LEAF_THICKNESS_MM, 3);
      expect(mm(b.min[2])).toBeCloseTo(0, 3);
      expect(mm(b.max[2])).toBeCloseTo(820, 3);
    }
    expect(mm(edges.max[1])).toBeCloseTo(2040, 3);
    // Two broad faces (4 triangles); the top and both edges (6), no bottom.
    expect(leaf.mesh.indices.length / 3).toBe(4);
    expect(leaf.edges.indices.length / 3).toBe(6);
  });

  it('puts a lever on each face near the free edge at handle height', () => {
    const handles = meshBounds(leaf.handles);
    expect(mm(handles.min[1])).toBeGreaterThan(HANDLE_HEIGHT_MM - 20);
    expect(mm(handles.max[1])).toBeLessThan(HANDLE_HEIGHT_MM + 20);
    // Out from both faces of the leaf (x 300–340 mm)…
    expect(mm(handles.min[0])).toBeLessThan(300 - 40);
    expect(mm(handles.max[0])).toBeGreaterThan(340 + 40);
    // …near the free end (820 mm from the hinge), within the leaf.
    expect(mm(handles.max[2])).toBeLessThan(820);
    expect(mm(handles.min[2])).toBeGreaterThan(820 - 250);
  });
});

describe('door and passage trims', () => {
  const scene = buildShellScene(example);

  it('lines the door through the wall and puts an architrave on both faces', () => {
    const trims = meshBounds(scene.walls[0].trims);
    const w = ARCHITRAVE_WIDTH_MM;
    expect(mm(trims.min[0])).toBeCloseTo(300 - w, 3);
    expect(mm(trims.max[0])).toBeCloseTo(1120 + w, 3);
    // From the architrave on the inside face to the one on the outside face (wall 0 runs y 0 to −100).
    expect(mm(trims.max[2])).toBeCloseTo(ARCHITRAVE_THICKNESS_MM, 3);
    expect(mm(trims.min[2])).toBeCloseTo(-100 - ARCHITRAVE_THICKNESS_MM, 3);
    expect(mm(trims.max[1])).toBeCloseTo(2040 + w, 3);
    // Lining: 3 boards; architraves: 3 pieces on each face; 12 triangles a box.
    expect(scene.walls[0].trims.indices.length / 3).toBe((3 + 6) * 12);
  });

  it('lines and frames a passage but gives it no leaf; windows get neither', () => {
    expect(scene.doorLeaves.map((d) => d.openingId)).toEqual(['d1']);
    expect(scene.walls[3].trims.indices.length / 3).toBe((3 + 6) * 12);
    const trims = meshBounds(scene.walls[3].trims);
    expect(mm(trims.max[1])).toBeCloseTo(2100 + ARCHITRAVE_WIDTH_MM, 3);
    expect(scene.walls[2].trims.indices.length).toBe(0);
    expect(scene.walls[1].trims.indices.length).toBe(0);
  });

  it('keeps the lining inside the hole, as thick as the wall', () => {
    // A passage alone on wall 0, so every box seen is of its trims.
    const shell = roomShellSchema.parse({
      ...designExampleRoom,
      openings: [{ id: 'p', type: 'passage', wall: 0, offset: 1000, width: 1000, height: 2000 }],
    });
    const trims = buildShellScene(shell).walls[0].trims;
    // The lining's inner faces stand LINING_THICKNESS_MM in from the hole's sides at x 1000 and 2000 mm.
    const xs = new Set<number>();
    for (let i = 0; i < trims.positions.length; i += 3) xs.add(Math.round(trims.positions[i] * 1000));
    expect(xs).toContain(1000 + LINING_THICKNESS_MM);
    expect(xs).toContain(2000 - LINING_THICKNESS_MM);
  });

  it('clips an architrave at a wall corner and under the ceiling', () => {
    const shell = roomShellSchema.parse({
      ...designExampleRoom,
      wallHeight: 2080,
      openings: [{ id: 'p', type: 'passage', wall: 0, offset: 0, width: 900, height: 2040 }],
    });
    const trims = meshBounds(buildShellScene(shell).walls[0].trims);
    expect(mm(trims.min[0])).toBeGreaterThanOrEqual(-100 - 1e-3);
    expect(mm(trims.max[1])).toBeCloseTo(2080, 3);
  });
});
