// Tests for a room's forms built together: each placed piece's meshes, laid in the room's one
// buffer, are number for number the piece's form written alone; pieces not placed are left out;
// a rebuild with one piece moved hands back the others' meshes as they were.
import { describe, expect, it } from 'vitest';
import { optionDocSchema, type Piece } from '../../schemas/option';
import { PIECE_KINDS } from '../../schemas/piece-kind';
import type { MeshData } from '../scene';
import { formParts } from './index';
import { formMeshes, type FormMeshes } from './mesh';
import { buildPieceForms, clearFormCache } from './piece-forms';

/** Every kind once, at assorted places, turns and heights, and one piece left off the plan. */
function room(): Piece[] {
  const pieces = PIECE_KINDS.map((kind, i) => ({
    id: `piece-${i}`,
    name: `Piece ${i}`,
    kind,
    x: 400 + (i % 6) * 900 + 0.25 * i,
    y: 500 + Math.floor(i / 6) * 800,
    width: 300 + ((i * 137) % 1500),
    depth: 200 + ((i * 71) % 900),
    height: 40 + ((i * 173) % 2000),
    rotation: (i * 41) % 360,
    elevation: i % 9 === 0 ? 1100 : 0,
    status: i % 2 === 0 ? 'new' : 'existing',
    placed: i !== 5,
  }));
  return optionDocSchema.parse({ pieces }).pieces;
}

const bytes = (m: MeshData) =>
  [m.positions, m.normals, m.uvs, m.indices].map((a) => Array.from(new Uint8Array(a.buffer, a.byteOffset, a.byteLength)));

function expectSameForm(actual: FormMeshes, expected: FormMeshes): void {
  for (const slot of ['main', 'accent', 'own'] as const) expect(bytes(actual[slot])).toEqual(bytes(expected[slot]));
  expect(actual.ownColours).toEqual(expected.ownColours);
}

const alone = (p: Piece) => formMeshes(formParts(p.kind, p.settings, { width: p.width, depth: p.depth, height: p.height }), p);

describe('a room of forms', () => {
  it("lays every placed piece's form in the room's buffer as the piece's form written alone", () => {
    clearFormCache();
    const pieces = room();
    const built = buildPieceForms(pieces);
    const placed = pieces.filter((p) => p.placed);
    expect(built.map((b) => b.id)).toEqual(placed.map((p) => p.id));
    built.forEach((b, i) => expectSameForm(b.meshes, alone(placed[i]!)));
  });

  it('keeps the forms of pieces not moved, and writes the moved one again where it now stands', () => {
    clearFormCache();
    const pieces = room();
    const first = buildPieceForms(pieces);
    const moved = pieces.map((p, i) => (i === 3 ? { ...p, x: p.x + 250, rotation: p.rotation + 90 } : p));
    const again = buildPieceForms(moved);
    const placed = moved.filter((p) => p.placed);
    again.forEach((b, i) => {
      if (b.id === 'piece-3') {
        expect(b.meshes).not.toBe(first[i]!.meshes);
        expectSameForm(b.meshes, alone(placed[i]!));
      } else expect(b.meshes).toBe(first[i]!.meshes);
    });
  });
});
