// Whether a worn model's measured size and the piece's box differ enough to ask which is meant:
// the shared rule (shared/geometry/model-fit.ts), read in the editor's terms.
import type { Piece } from '../../../../shared/schemas/option';
import type { PieceModel } from '../../../../shared/schemas/piece-model';
import { MODEL_SIZE_TOLERANCE, sizeDifference } from '../../../../shared/geometry/model-fit';

/** Whether the model's measured size and the piece's box differ by more than the tolerance on any side. */
export function sizeDiffers(piece: Pick<Piece, 'width' | 'depth' | 'height'>, size: NonNullable<PieceModel['size']>): boolean {
  return sizeDifference(size, piece) > MODEL_SIZE_TOLERANCE;
}
