// Tests for the colours of piece boxes: a piece's own colour or the neutral for existing or new,
// and the tint of the selected piece.
import * as THREE from 'three';
import { describe, expect, it } from 'vitest';
import { buildRoomScene } from '../../shared/geometry/scene';
import { mergedRanges } from './build-geometry';
import { PIECE_COLOURS } from './materials';
import { pieceVertexColours } from './piece-colours';
import { examplePieces, exampleShell } from './test-rooms';

describe('pieceVertexColours', () => {
  const scene = buildRoomScene(exampleShell, { pieces: examplePieces });
  const looks = scene.pieces.map((p) => ({ ...examplePieces.find((e) => e.id === p.id)! }));
  const ranges = mergedRanges(scene.pieces.map((p) => p.mesh));
  const colourAt = (colours: Float32Array, pieceIndex: number) =>
    new THREE.Color().fromArray(colours, ranges.vertexStarts[pieceIndex] * 3).getHexString();

  it('uses a piece’s own colour, or a calm neutral that tells existing from new', () => {
    const colours = pieceVertexColours(looks, ranges, null);
    expect(`#${colourAt(colours, 0)}`).toBe(PIECE_COLOURS.new);
    expect(`#${colourAt(colours, 1)}`).toBe('#8a6a4f');
    expect(`#${colourAt(colours, 2)}`).toBe(PIECE_COLOURS.existing);
    expect(PIECE_COLOURS.new).not.toBe(PIECE_COLOURS.existing);
  });

  it('tints only the selected piece', () => {
    const plain = pieceVertexColours(looks, ranges, null);
    const selected = pieceVertexColours(looks, ranges, 'table');
    expect(colourAt(selected, 1)).not.toBe(colourAt(plain, 1));
    expect(colourAt(selected, 0)).toBe(colourAt(plain, 0));
    expect(colourAt(selected, 2)).toBe(colourAt(plain, 2));
  });
});
