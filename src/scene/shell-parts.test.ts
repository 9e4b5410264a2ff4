// Tests for grouping the room shell into meshes: each window with its wall, and every triangle of
// each wall's outside face, top and reveals kept in the wall body, the trims where they belong.
import { describe, expect, it } from 'vitest';
import { buildRoomScene } from '../../shared/geometry/scene';
import { shellParts } from './shell-parts';
import { exampleShell, lShapedShell } from './test-rooms';

describe('shellParts', () => {
  it('puts each window with the wall it is in, so it fades with that wall', () => {
    const parts = shellParts(buildRoomScene(lShapedShell, { pieces: [] }), lShapedShell);
    const withWindows = parts.walls.filter((w) => w.frames.indices.length > 0).map((w) => w.index);
    expect(withWindows).toEqual([0, 1]);
    expect(parts.walls.filter((w) => w.glass.indices.length > 0).map((w) => w.index)).toEqual([0, 1]);
  });

  it('keeps every triangle of the outside face, top and reveals in the wall body', () => {
    const scene = buildRoomScene(exampleShell, { pieces: [] });
    const parts = shellParts(scene, exampleShell);
    scene.walls.forEach((wall, i) => {
      expect(parts.walls[i].body.indices.length).toBe(
        wall.outside.indices.length + wall.top.indices.length + wall.reveals.indices.length,
      );
    });
    expect(parts.doorLeaves.indices.length).toBe(scene.doorLeaves[0].mesh.indices.length);
    expect(parts.handles.indices.length).toBe(scene.doorLeaves[0].handles.indices.length);
  });

  it('puts the skirting and the leaves edges in the one trim mesh, and door trims with their wall', () => {
    const scene = buildRoomScene(exampleShell, { pieces: [] });
    const parts = shellParts(scene, exampleShell);
    expect(parts.trim.indices.length).toBe(scene.skirting.indices.length + scene.doorLeaves[0].edges.indices.length);
    scene.walls.forEach((wall, i) => {
      const windows = scene.windows.filter((w) => exampleShell.openings.find((o) => o.id === w.openingId)?.wall === i);
      const windowTriangles = windows.reduce((sum, w) => sum + w.frame.indices.length + w.sill.indices.length, 0);
      expect(parts.walls[i].frames.indices.length).toBe(windowTriangles + wall.trims.indices.length);
    });
  });
});
