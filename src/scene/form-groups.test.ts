// Tests for drawing piece forms merged per material: mesh counts for a typical room of 40 pieces,
// the selected piece's tint, and the colours of accent parts.
import { describe, expect, it } from 'vitest';
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import type { SceneFinish } from '../../shared/finishes/scene-finish';
import { typicalFurnishedRoom } from '../../scripts/bench/typical-room';
import { accentColourOf, formGroups, groupVertexColours } from './form-groups';
import { ACCENT_COLOURS } from './materials';

const photo = (name: string): SceneFinish => ({
  kind: 'photo',
  textureUrl: `/api/files/${name}.webp`,
  repeatWidthMm: 600,
  repeatHeightMm: 600,
  meanColourHex: '#887766',
  roughness: 0.8,
});
const paint: SceneFinish = { kind: 'paint', colourHex: '#335577', roughness: 0.9 };

describe('piece forms merged per material', () => {
  it('draws a typical room of 40 pieces with one colour mesh plus one per photo finish worn, main or accent', () => {
    const { option } = typicalFurnishedRoom();
    const forms = buildPieceForms(option.pieces);
    const pieces: Record<string, SceneFinish> = {};
    const pieceAccents: Record<string, SceneFinish> = {};
    option.pieces.forEach((p, i) => {
      if (i % 4 === 0) pieces[p.id] = photo(`main-${i % 3}`);
      if (i % 5 === 0) pieceAccents[p.id] = photo(`accent-${i % 3}`);
      if (i % 7 === 1) pieces[p.id] = paint;
    });
    const groups = formGroups(forms, option.pieces, { pieces, pieceAccents });
    const photos = new Set(
      [...Object.values(pieces), ...Object.values(pieceAccents)].filter((f) => f.kind === 'photo').map((f) => JSON.stringify(f)),
    );
    expect(groups.length).toBe(1 + photos.size);
    expect(groups[0].key).toBe('colour');
    // Every vertex of every form is in exactly one group.
    const formVertices = forms.reduce(
      (n, f) => n + (f.meshes.main.positions.length + f.meshes.accent.positions.length + f.meshes.own.positions.length) / 3,
      0,
    );
    const groupVertices = groups.reduce((n, g) => n + g.entries.reduce((m, e) => m + e.mesh.positions.length / 3, 0), 0);
    expect(groupVertices).toBe(formVertices);
    for (const g of groups)
      expect(groupVertexColours(g, null).length).toBe(g.entries.reduce((m, e) => m + e.mesh.positions.length, 0));
  });

  it('tints only the selected piece', () => {
    const { option } = typicalFurnishedRoom();
    const forms = buildPieceForms(option.pieces.slice(0, 2));
    const [group] = formGroups(forms, option.pieces, {});
    const plain = groupVertexColours(group, null);
    const tinted = groupVertexColours(group, option.pieces[1].id);
    const firstCount = group.entries
      .filter((e) => e.pieceId === option.pieces[0].id)
      .reduce((n, e) => n + e.mesh.positions.length, 0);
    expect(Array.from(tinted.slice(0, firstCount))).toEqual(Array.from(plain.slice(0, firstCount)));
    expect(Array.from(tinted.slice(firstCount))).not.toEqual(Array.from(plain.slice(firstCount)));
  });

  it('gives accent parts the paint, the accent colour, or the darker neutral', () => {
    expect(accentColourOf({ status: 'new', accentColour: '#112233' }, paint)).toBe('#335577');
    expect(accentColourOf({ status: 'new', accentColour: '#112233' }, null)).toBe('#112233');
    expect(accentColourOf({ status: 'existing' }, undefined)).toBe(ACCENT_COLOURS.existing);
  });
});
