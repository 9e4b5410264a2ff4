// What the editor's 3D preview draws for the pieces that wear a model: each placed piece whose model
// is ready in the studio's library, its file behind the studio's own file route, drawn as the
// client's page will (fitted into the box, turned, wearing the piece's finishes when asked).
import type { Piece } from '../../../../shared/schemas/option';
import type { PieceModel } from '../../../../shared/schemas/piece-model';
import type { ModelSource } from '../../../scene/piece-models';

/** The model source of each placed piece wearing a ready model, by piece id; others keep their forms. */
export function sceneModelsFor(
  pieces: readonly Piece[],
  models: ReadonlyMap<string, PieceModel>,
): ReadonlyMap<string, ModelSource> {
  const out = new Map<string, ModelSource>();
  for (const piece of pieces) {
    const model = piece.placed && piece.modelId ? models.get(piece.modelId) : undefined;
    if (!model || model.status !== 'ready' || !model.modelUrl) continue;
    out.set(piece.id, { url: model.modelUrl, turnDeg: model.turnDeg, wearsFinishes: piece.modelWearsFinishes === true });
  }
  return out;
}
