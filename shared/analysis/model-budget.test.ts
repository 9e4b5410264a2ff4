// The estimate behind the Check step's notice on heavy models: the shell and the forms counted as the
// views draw them, each worn model's stored triangles and materials added per placed copy, and the
// budget for a room with models (the piece-models issue: ≤ 90 draw calls, ≤ 300,000 triangles).
import { describe, expect, it } from 'vitest';
import { buildPieceForms } from '../geometry/forms/piece-forms';
import { buildShellScene } from '../geometry/scene';
import type { SceneFinish } from '../finishes/scene-finish';
import { roomShellSchema } from '../schemas/room';
import { pieceSchema } from '../schemas/option';
import { designExampleRoom } from '../../tests/reference/rooms';
import { FLOOR_SHADOW_DRAW_CALLS, MODEL_BUDGET, formFigures, modelBudget, shellFigures } from './model-budget';

const shell = roomShellSchema.parse(designExampleRoom);
const photo: SceneFinish = {
  kind: 'photo',
  textureUrl: '/api/files/linen.webp',
  repeatWidthMm: 600,
  repeatHeightMm: 600,
  meanColourHex: '#887766',
  roughness: 0.9,
};
const piece = (id: string, extra: Record<string, unknown> = {}) =>
  pieceSchema.parse({ id, name: id, x: 2000, y: 1800, width: 900, depth: 800, height: 800, status: 'new', ...extra });

describe('shellFigures', () => {
  it('counts the example room (a door, a window, a passage) as the views draw it', () => {
    const figures = shellFigures(buildShellScene(shell), shell);
    // Counted by hand: the outside, floor, ceiling, leaf, handles, trim; four inside faces and four
    // wall bodies; frames on the door's, the window's and the passage's walls; the window's glass.
    expect(figures.drawCalls).toBe(1 + 5 + 4 + 4 + 3 + 1);
    expect(figures.triangles).toBeGreaterThan(100);
  });
});

describe('formFigures', () => {
  it('merges plain colours into one mesh, a photo finish into its own, rugs apart', () => {
    const pieces = [
      piece('sofa', { kind: 'sofa' }),
      piece('chair', { kind: 'armchair' }),
      piece('rug', { kind: 'rug', height: 10 }),
    ];
    const forms = buildPieceForms(pieces);
    const plain = formFigures(forms, pieces, {});
    expect(plain.drawCalls).toBe(2);
    const triangles = forms.reduce(
      (n, f) => n + (f.meshes.main.indices.length + f.meshes.accent.indices.length + f.meshes.own.indices.length) / 3,
      0,
    );
    expect(plain.triangles).toBe(triangles);
    expect(formFigures(forms, pieces, { pieces: { sofa: photo, chair: photo } }).drawCalls).toBe(3);
  });
});

describe('modelBudget', () => {
  const room = { drawCalls: 30, triangles: 40_000 };
  it('says nothing for an option without models', () => {
    expect(modelBudget(room, [])).toBeNull();
  });
  it('adds a draw call per material of each placed model and its triangles', () => {
    const chairs = Array.from({ length: 4 }, () => ({ triangles: 72, materials: 2 }));
    expect(modelBudget(room, chairs)).toEqual({
      drawCalls: 30 + FLOOR_SHADOW_DRAW_CALLS + 8,
      triangles: 40_000 + 288,
      models: 4,
      overDrawCalls: false,
      overTriangles: false,
    });
  });
  it('finds ten models at the upload limits heavy on both counts', () => {
    // 30,000 triangles and 6 materials: the most a model keeps once normalised.
    const heavy = Array.from({ length: 10 }, () => ({ triangles: 30_000, materials: 6 }));
    const budget = modelBudget(room, heavy)!;
    expect(budget.triangles).toBe(340_000);
    expect(budget.triangles).toBeGreaterThan(MODEL_BUDGET.triangles);
    expect(budget.drawCalls).toBe(91);
    expect(budget.overDrawCalls).toBe(true);
    expect(budget.overTriangles).toBe(true);
  });
  it('stays within at the budget itself', () => {
    const budget = modelBudget({ drawCalls: 89 - FLOOR_SHADOW_DRAW_CALLS, triangles: 299_000 }, [
      { triangles: 1000, materials: 1 },
    ])!;
    expect([budget.drawCalls, budget.triangles]).toEqual([90, 300_000]);
    expect(budget.overDrawCalls || budget.overTriangles).toBe(false);
  });
});
