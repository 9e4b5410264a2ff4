// Whether a worn model's measured size and the piece's box differ enough to ask which is meant.
import type { Piece } from '../../../../shared/schemas/option';
import type { PieceModel } from '../../../../shared/schemas/piece-model';

/** A model's side may differ from the piece's box by this share before the editor asks which size is meant. */
export const MODEL_SIZE_TOLERANCE = 0.02;

/** Whether the model's measured size and the piece's box differ by more than the tolerance on any side. */
export function sizeDiffers(piece: Pick<Piece, 'width' | 'depth' | 'height'>, size: NonNullable<PieceModel['size']>): boolean {
  const sides: [number, number][] = [
    [size.widthMm, piece.width],
    [size.depthMm, piece.depth],
    [size.heightMm, piece.height],
  ];
  return sides.some(([model, box]) => Math.abs(model - box) > MODEL_SIZE_TOLERANCE * box);
}
