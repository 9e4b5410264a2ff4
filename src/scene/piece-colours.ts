// The colours of piece boxes in 3D: a piece's own colour or the neutral for its status, written per
// vertex with the selected piece tinted.
import * as THREE from 'three';
import type { Piece } from '../../shared/schemas/option';
import type { MergedRanges } from './build-geometry';
import { PIECE_COLOURS, SELECTION_COLOUR, SELECTION_TINT } from './materials';

type PieceLook = Pick<Piece, 'id' | 'status' | 'colour'>;

/** A piece's own colour, or the calm neutral for its status when it has none. */
export function pieceBaseColour(piece: Pick<Piece, 'status' | 'colour'>): string {
  return piece.colour ?? PIECE_COLOURS[piece.status];
}

/**
 * Per-vertex colours (linear RGB, three's working space) for merged piece boxes: each part gets its
 * piece's colour, the selected one tinted towards the accent. `parts` are in the merged order.
 */
export function pieceVertexColours(parts: readonly PieceLook[], ranges: MergedRanges, selectedId: string | null): Float32Array {
  const vertexStarts = ranges.vertexStarts;
  const colours = new Float32Array(vertexStarts[vertexStarts.length - 1] * 3);
  const colour = new THREE.Color();
  const accent = new THREE.Color(SELECTION_COLOUR);
  parts.forEach((part, i) => {
    colour.set(pieceBaseColour(part));
    if (part.id === selectedId) colour.lerp(accent, SELECTION_TINT);
    for (let v = vertexStarts[i]; v < vertexStarts[i + 1]; v++) colour.toArray(colours, v * 3);
  });
  return colours;
}
