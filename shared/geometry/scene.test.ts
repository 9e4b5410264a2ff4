// Tests for the 3D scene built from a room (the README's plan-file example and the benchmark room):
// faces and normals, floor, ceiling, walls, reveals, door leaves, windows and placed pieces.
import { describe, expect, it } from 'vitest';
import { typicalRoom } from '../../scripts/bench/typical-room';
import { optionDocSchema, type OptionDocInput } from '../schemas/option';
import { roomShellSchema, type RoomShellInput } from '../schemas/room';
import { buildPiecesScene, buildRoomScene, buildShellScene, meshBounds, sceneMeshes, type MeshData } from './scene';
import { designExampleRoom as example } from '../../tests/reference/rooms';

function scene(shell: RoomShellInput = example, option: OptionDocInput = {}) {
  return buildRoomScene(roomShellSchema.parse(shell), optionDocSchema.parse(option));
}

type V = [number, number, number];
function vertex(mesh: MeshData, i: number): V {
  return [mesh.positions[3 * i], mesh.positions[3 * i + 1], mesh.positions[3 * i + 2]];
}
function crossOf(a: V, b: V, c: V): V {
  const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const v = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
  return [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
}

function area(mesh: MeshData): number {
  let total = 0;
  for (let k = 0; k < mesh.indices.length; k += 3) {
    const n = crossOf(vertex(mesh, mesh.indices[k]), vertex(mesh, mesh.indices[k + 1]), vertex(mesh, mesh.indices[k + 2]));
    total += Math.hypot(...n) / 2;
  }
  return total;
}

// Float32 positions hold about 7 significant digits, so areas are compared to 4 decimals (1 cm²).
// Every triangle must run counter-clockwise seen from the side its vertex normals point to.
function misfacedTriangles(mesh: MeshData): number {
  let wrong = 0;
  for (let k = 0; k < mesh.indices.length; k += 3) {
    const [a, b, c] = [mesh.indices[k], mesh.indices[k + 1], mesh.indices[k + 2]];
    const n = crossOf(vertex(mesh, a), vertex(mesh, b), vertex(mesh, c));
    const normal = [mesh.normals[3 * a], mesh.normals[3 * a + 1], mesh.normals[3 * a + 2]];
    if (n[0] * normal[0] + n[1] * normal[1] + n[2] * normal[2] <= 0) wrong++;
  }
  return wrong;
}

describe('buildRoomScene', () => {
  it('faces every triangle the way its normal points', () => {
    for (const data of [
      scene(),
      scene({ ...example, outline: [...(example.outline as [number, number][])].reverse(), openings: [] }),
      (() => {
        const { shell, option } = typicalRoom();
        return buildRoomScene(shell, option);
      })(),
    ]) {
      for (const mesh of sceneMeshes(data)) expect(misfacedTriangles(mesh)).toBe(0);
    }
  });

  it('faces square-cut joins outward at thickness steps and sharp corners', () => {
    const stepped = scene({
      outline: [
        [0, 0],
        [2000, 0],
        [4000, 0],
        [4000, 3000],
        [0, 3000],
      ],
      wallThicknesses: [100, 250],
      openings: [],
    });
    const sharp = scene({
      outline: [
        [0, 0],
        [5000, 0],
        [0, 300],
      ],
      openings: [],
    });
    for (const data of [stepped, sharp]) for (const mesh of sceneMeshes(data)) expect(misfacedTriangles(mesh)).toBe(0);
    // the step face (150 mm × 2.6 m) is part of wall 1's outside
    expect(area(stepped.walls[1].outside)).toBeCloseTo(0.15 * 2.6 + 2.1 * 2.6, 4);
  });

  it('lays the floor over the outline at plan x → scene x, plan y → scene z, with uvs in metres', () => {
    const data = scene();
    expect(area(data.floor)).toBeCloseTo(15.12, 4);
    expect(meshBounds(data.floor)).toEqual({ min: [0, 0, 0], max: [expect.closeTo(4.2, 6), 0, expect.closeTo(3.6, 6)] });
    for (let i = 0; i < data.floor.normals.length; i += 3) expect(data.floor.normals[i + 1]).toBe(1);
    // uv equals the plan position in metres, so a finish repeats at its real size
    expect(Array.from(data.floor.uvs)).toEqual(Array.from(data.floor.positions).filter((_, i) => i % 3 !== 1));
  });

  it('hangs the ceiling at wall height facing down', () => {
    const data = scene();
    expect(meshBounds(data.ceiling).min[1]).toBeCloseTo(2.6, 6);
    expect(data.ceiling.normals[1]).toBe(-1);
    expect(area(data.ceiling)).toBeCloseTo(15.12, 4);
  });

  it('builds each inside face separately with the openings cut out, facing into the room', () => {
    const data = scene();
    expect(data.walls.map((w) => w.index)).toEqual([0, 1, 2, 3]);
    const wall0 = data.walls[0].inside;
    expect(area(wall0)).toBeCloseTo(10.92 - 0.82 * 2.04, 4);
    expect(area(data.walls[2].inside)).toBeCloseTo(10.92 - 1.5 * 1.2, 4);
    // wall 0 runs along the top of the plan, so into the room is +z
    expect([wall0.normals[0], wall0.normals[1], wall0.normals[2]].map((v) => v + 0)).toEqual([0, 0, 1]);
    const uMax = Math.max(...Array.from(wall0.uvs).filter((_, i) => i % 2 === 0));
    const vMax = Math.max(...Array.from(wall0.uvs).filter((_, i) => i % 2 === 1));
    expect(uMax).toBeCloseTo(4.2, 6);
    expect(vMax).toBeCloseTo(2.6, 6);
  });

  it('runs the inside face u from the wall start corner', () => {
    const wall2 = scene().walls[2].inside;
    // wall 2 starts at plan (4200, 3600): the vertex with u = 0 sits at scene x = 4.2
    for (let i = 0; i < wall2.uvs.length / 2; i++) {
      if (wall2.uvs[2 * i] === 0) expect(wall2.positions[3 * i]).toBeCloseTo(4.2, 6);
    }
  });

  it('builds outside faces to the mitred corners and wall tops over the thickness', () => {
    const data = scene();
    expect(area(data.walls[0].outside)).toBeCloseTo(4.4 * 2.6 - 0.82 * 2.04, 4);
    expect(data.walls[0].outside.normals[2]).toBe(-1);
    const tops = data.walls.reduce((sum, w) => sum + area(w.top), 0);
    expect(tops).toBeCloseTo(4.4 * 3.8 - 15.12, 4);
    expect(meshBounds(data.walls[0].top).min[1]).toBeCloseTo(2.6, 6);
  });

  it('closes each opening with reveals: two sides, a head and a bottom', () => {
    const data = scene();
    const door = data.walls[0].reveals;
    expect(door.indices.length).toBe(4 * 6);
    expect(area(door)).toBeCloseTo(2 * 0.1 * 2.04 + 2 * 0.82 * 0.1, 4);
    const window = data.walls[2].reveals;
    expect(meshBounds(window).min[1]).toBeCloseTo(0.9, 6);
    expect(meshBounds(window).max[1]).toBeCloseTo(2.1, 6);
    expect(data.walls[1].reveals.indices.length).toBe(0);
  });

  it('shows the door leaf open at 90° on the swing side', () => {
    const leafIn = meshBounds(scene().doorLeaves[0].mesh);
    expect(leafIn.min[2]).toBeCloseTo(0, 6);
    expect(leafIn.max[2]).toBeCloseTo(0.82, 6);
    expect(leafIn.min[0]).toBeCloseTo(0.3, 6);
    expect(leafIn.max[0]).toBeCloseTo(0.34, 6);
    const outward = {
      ...example,
      openings: [
        {
          id: 'd1',
          type: 'door' as const,
          wall: 0,
          offset: 300,
          width: 820,
          height: 2040,
          hinge: 'end' as const,
          swing: 'out' as const,
        },
      ],
    };
    const leafOut = meshBounds(scene(outward).doorLeaves[0].mesh);
    expect(leafOut.max[2]).toBeCloseTo(-0.1, 6);
    expect(leafOut.min[2]).toBeCloseTo(-0.92, 6);
    expect(leafOut.max[0]).toBeCloseTo(1.12, 6);
  });

  it('puts a window frame and pane inside the opening', () => {
    const data = scene();
    expect(data.windows.map((w) => w.openingId)).toEqual(['w1']);
    const glass = meshBounds(data.windows[0].glass);
    // window w1 spans plan x 1700–3200 on wall 2 (y = 3600 to 3700)
    expect(glass.min[0]).toBeGreaterThan(1.7);
    expect(glass.max[0]).toBeLessThan(3.2);
    expect(glass.min[2]).toBeGreaterThan(3.6);
    expect(glass.max[2]).toBeLessThan(3.7);
    const frame = meshBounds(data.windows[0].frame);
    expect(frame.min[1]).toBeCloseTo(0.9, 6);
    expect(frame.max[1]).toBeCloseTo(2.1, 6);
  });

  it('draws placed pieces as turned, raised boxes keyed by id', () => {
    const data = scene(example, {
      pieces: [
        { id: 'sofa', name: 'Sofa', x: 2100, y: 3100, width: 2100, depth: 900, height: 850, rotation: 90, status: 'new' },
        { id: 'shelf', name: 'Shelf', x: 1000, y: 300, width: 800, depth: 250, height: 300, elevation: 1500, status: 'existing' },
        { id: 'old-chair', name: 'Chair', x: 0, y: 0, width: 600, depth: 600, height: 800, status: 'existing', placed: false },
      ],
    });
    expect(data.pieces.map((p) => p.id)).toEqual(['sofa', 'shelf']);
    const sofa = meshBounds(data.pieces[0].mesh);
    // turned 90°, the 2100 mm width runs along plan y
    expect(sofa.max[0] - sofa.min[0]).toBeCloseTo(0.9, 5);
    expect(sofa.max[2] - sofa.min[2]).toBeCloseTo(2.1, 5);
    expect((sofa.min[2] + sofa.max[2]) / 2).toBeCloseTo(3.1, 5);
    const shelf = meshBounds(data.pieces[1].mesh);
    expect(shelf.min[1]).toBeCloseTo(1.5, 6);
    expect(shelf.max[1]).toBeCloseTo(1.8, 6);
    expect(area(data.pieces[1].mesh)).toBeCloseTo(2 * (0.8 * 0.25 + 0.8 * 0.3 + 0.25 * 0.3), 4);
  });

  it('turns a piece clockwise seen from above', () => {
    // A 2 m × 0.1 m bar turned 45° clockwise on the plan points its +x end down the page (+z).
    const data = scene(example, {
      pieces: [{ id: 'bar', name: 'Bar', x: 2000, y: 2000, width: 2000, depth: 10, height: 100, rotation: 45, status: 'new' }],
    });
    const mesh = data.pieces[0].mesh;
    let far: V = [0, 0, 0];
    for (let i = 0; i < mesh.positions.length / 3; i++) if (vertex(mesh, i)[0] > far[0]) far = vertex(mesh, i);
    expect(far[2]).toBeGreaterThan(2.5);
  });

  it('bounds the whole scene including the walls outside faces and the architraves on them', () => {
    const bounds = scene().bounds;
    // The door on wall 0 (y −0.1) and the passage on wall 3 (x −0.1) have 15 mm architraves outside.
    expect(bounds.min.map((v) => Number(v.toFixed(6)))).toEqual([-0.115, 0, -0.115]);
    expect(bounds.max.map((v) => Number(v.toFixed(6)))).toEqual([4.3, 2.6, 3.7]);
  });

  it('keeps inside faces facing in when the outline is drawn the other way round', () => {
    const reversed = scene({
      ...example,
      outline: [
        [0, 0],
        [0, 3600],
        [4200, 3600],
        [4200, 0],
      ],
      openings: [],
    });
    // wall 0 now runs down the left side; into the room is +x
    expect(reversed.walls[0].inside.normals[0]).toBeCloseTo(1, 9);
    expect(reversed.walls[0].inside.normals[2]).toBeCloseTo(0, 9);
    expect(reversed.floor.normals[1]).toBe(1);
    expect(area(reversed.floor)).toBeCloseTo(15.12, 4);
  });

  // Speed is measured by `npm run bench`, never by a timed test; this checks the benchmark's room is what it claims.
  it('builds the benchmark room: 8 walls, 6 openings, 40 pieces', () => {
    const { shell, option } = typicalRoom();
    const scene = buildRoomScene(shell, option);
    expect(scene.walls).toHaveLength(8);
    expect(shell.openings).toHaveLength(6);
    expect(scene.pieces).toHaveLength(40);
    expect(scene.doorLeaves.length + scene.windows.length).toBe(shell.openings.filter((o) => o.type !== 'passage').length);
  });

  it('is the shell builder and the pieces builder together: each can be built alone, once', () => {
    const { shell, option } = typicalRoom();
    const whole = buildRoomScene(shell, option);
    const room = buildShellScene(shell);
    const pieces = buildPiecesScene(option.pieces);
    expect(pieces).toEqual(whole.pieces);
    expect(room.walls).toEqual(whole.walls);
    expect([room.floor, room.ceiling, room.doorLeaves, room.windows]).toEqual([
      whole.floor,
      whole.ceiling,
      whole.doorLeaves,
      whole.windows,
    ]);
    // The shell's bounds are its own; the room's take in the pieces as well.
    expect(room.bounds).toEqual(meshBoundsOf(sceneMeshes(room)));
    expect(whole.bounds).toEqual(meshBoundsOf(sceneMeshes(whole)));
  });

  it('builds only placed pieces, each as a closed box on its footprint', () => {
    const [chest, more] = buildPiecesScene(
      optionDocSchema.parse({
        pieces: [
          { id: 'waiting', name: 'Waiting', x: 0, y: 0, width: 500, depth: 500, height: 500, status: 'new', placed: false },
          { id: 'chest', name: 'Chest', x: 1000, y: 2000, width: 800, depth: 400, height: 900, status: 'new', rotation: 90 },
        ],
      }).pieces,
    );
    expect(more).toBeUndefined();
    expect(chest?.id).toBe('chest');
    const b = meshBounds(chest!.mesh);
    // Turned 90°: 400 mm across x, 800 mm along z (plan y), 0.9 m tall.
    expect(b.min.map((v) => Number(v.toFixed(4)))).toEqual([0.8, 0, 1.6]);
    expect(b.max.map((v) => Number(v.toFixed(4)))).toEqual([1.2, 0.9, 2.4]);
  });
});

function meshBoundsOf(meshes: readonly MeshData[]) {
  const all = meshes.map(meshBounds);
  return {
    min: [0, 1, 2].map((k) => Math.min(...all.map((b) => b.min[k]!))),
    max: [0, 1, 2].map((k) => Math.max(...all.map((b) => b.max[k]!))),
  };
}
