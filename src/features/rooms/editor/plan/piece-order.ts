// The order the plan draws its pieces in, which is also the order clicks find them: pieces walked
// over (rugs) first, under everything standing on them, then the rest in their own order.
import { isWalkedOver } from '../../../../../shared/geometry/piece';
import type { Piece } from '../../../../../shared/schemas/option';

/**
 * The pieces as the plan draws them, bottom first: walked-over pieces (rugs) below the others, so
 * the coffee table on a rug is drawn over it and takes the click; otherwise the pieces' own order.
 */
export function piecesInDrawOrder<P extends Pick<Piece, 'kind' | 'elevation' | 'height'>>(pieces: readonly P[]): P[] {
  return [...pieces.filter((p) => isWalkedOver(p)), ...pieces.filter((p) => !isWalkedOver(p))];
}
