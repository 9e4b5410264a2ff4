// The Check step's estimate of what the client's view draws (shared/analysis/model-budget.ts) counts
// the meshes the views really make: the shell's parts (plus the outside) and the forms' groups.
import { describe, expect, it } from 'vitest';
import { formFigures, shellFigures } from '../../shared/analysis/model-budget';
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import { buildShellScene } from '../../shared/geometry/scene';
import type { SceneFinish } from '../../shared/finishes/scene-finish';
import { typicalFurnishedRoom } from '../../scripts/bench/typical-room';
import { formGroups } from './form-groups';
import { disposeShellGeometries, shellGeometries, shellParts } from './shell-parts';
import { exampleShell, lShapedShell } from './test-rooms';

describe('the budget estimate counts what the views draw', () => {
  it('one draw call per shell part the view makes, and one for the outside', () => {
    const { shell: typical } = typicalFurnishedRoom();
    for (const shell of [exampleShell, lShapedShell, typical]) {
      const scene = buildShellScene(shell);
      const geometries = shellGeometries(shellParts(scene, shell));
      const made = [
        geometries.floor,
        geometries.ceiling,
        geometries.doorLeaves,
        geometries.handles,
        geometries.trim,
        ...geometries.walls.flatMap((w) => [w.inside, w.body, w.frames, w.glass]),
      ];
      const triangles = made.reduce((n, g) => n + (g?.index ? g.index.count / 3 : 0), 0);
      const figures = shellFigures(scene, shell);
      expect(figures.drawCalls).toBe(made.filter(Boolean).length + 1);
      expect(figures.triangles).toBeGreaterThan(triangles);
      disposeShellGeometries(geometries);
    }
  });

  it('one draw call per group of merged forms', () => {
    const { option } = typicalFurnishedRoom();
    const forms = buildPieceForms(option.pieces);
    const photo = (n: number): SceneFinish => ({
      kind: 'photo',
      textureUrl: `/api/files/${n}.webp`,
      repeatWidthMm: 600,
      repeatHeightMm: 600,
      meanColourHex: '#887766',
      roughness: 0.8,
    });
    const pieces: Record<string, SceneFinish> = {};
    const pieceAccents: Record<string, SceneFinish> = {};
    option.pieces.forEach((p, i) => {
      if (i % 4 === 0) pieces[p.id] = photo(i % 3);
      if (i % 5 === 0) pieceAccents[p.id] = photo(3 + (i % 2));
    });
    const groups = formGroups(forms, option.pieces, { pieces, pieceAccents });
    const figures = formFigures(forms, option.pieces, { pieces, pieceAccents });
    expect(figures.drawCalls).toBe(groups.length);
    expect(figures.triangles).toBe(groups.reduce((n, g) => n + g.entries.reduce((m, e) => m + e.mesh.indices.length / 3, 0), 0));
  });
});
