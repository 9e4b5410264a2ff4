// Tests for drawing piece forms merged per material: mesh counts for a typical room of 40 pieces,
// rugs drawn apart, the selected piece's tint, and the colours of accent parts.
import { describe, expect, it } from 'vitest';
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import type { SceneFinish } from '../../shared/finishes/scene-finish';
import { isWalkedOver } from '../../shared/geometry/piece';
import type { Piece } from '../../shared/schemas/option';
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
    // The room's two rugs are drawn apart (just above the floor): in groups of their own, and only they.
    const walkedOver = new Set(option.pieces.filter(isWalkedOver).map((p) => p.id));
    expect(walkedOver.size).toBe(2);
    const photosWornBy = (standing: boolean) =>
      new Set(
        option.pieces
          .filter((p) => walkedOver.has(p.id) !== standing)
          .flatMap((p) => [pieces[p.id], pieceAccents[p.id]])
          .filter((f) => f?.kind === 'photo')
          .map((f) => JSON.stringify(f)),
      );
    const standing = groups.filter((g) => !g.flat);
    expect(standing.length).toBe(1 + photosWornBy(true).size);
    expect(groups[0].key).toBe('colour');
    const flat = groups.filter((g) => g.flat);
    expect(flat.length).toBeGreaterThan(0);
    expect(flat.length).toBeLessThanOrEqual(1 + photosWornBy(false).size);
    for (const g of flat) for (const e of g.entries) expect(walkedOver.has(e.pieceId)).toBe(true);
    for (const g of standing) for (const e of g.entries) expect(walkedOver.has(e.pieceId)).toBe(false);
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

  it('draws a rug apart from the coffee table standing on it, in its own group', () => {
    const base = { x: 2000, y: 1500, rotation: 0, elevation: 0, status: 'new', placed: true } as const;
    const rug = { ...base, id: 'rug', name: 'Rug', kind: 'rug', width: 2000, depth: 1400, height: 10 } as Piece;
    const table = {
      ...base,
      id: 'table',
      name: 'Coffee table',
      kind: 'coffee-table',
      width: 1100,
      depth: 600,
      height: 420,
    } as Piece;
    const groups = formGroups(buildPieceForms([rug, table]), [rug, table], {});
    expect(groups.map((g) => [g.key, g.flat])).toEqual([
      ['colour', false],
      ['colour|flat', true],
    ]);
    expect(new Set(groups[0].entries.map((e) => e.pieceId))).toEqual(new Set(['table']));
    expect(new Set(groups[1].entries.map((e) => e.pieceId))).toEqual(new Set(['rug']));
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
