import type { Finish } from '../../../../shared/schemas/finish';
import type { OptionDoc } from '../../../../shared/schemas/option';
import { toSceneFinish, type SceneFinish } from '../../../../shared/finishes/scene-finish';
import type { SurfaceFinishes } from '../../../scene/room-view';

/** What an option's surfaces and pieces wear in 3D, from its finish ids and the studio's finishes. */
export function sceneFinishesFor(
  doc: OptionDoc | undefined,
  finishes: ReadonlyMap<string, Finish>,
  size: 'standard' | 'large' = 'standard',
): SurfaceFinishes {
  if (!doc) return {};
  const scene = (id: string | null | undefined): SceneFinish | null => {
    const f = id ? finishes.get(id) : undefined;
    return f ? toSceneFinish(f, { size }) : null;
  };
  const wallOverrides: Record<string, SceneFinish> = {};
  for (const [wall, id] of Object.entries(doc.finishes.wallOverrides)) {
    const f = scene(id);
    if (f) wallOverrides[wall] = f;
  }
  const pieces: Record<string, SceneFinish> = {};
  const pieceAccents: Record<string, SceneFinish> = {};
  for (const p of doc.pieces) {
    const main = scene(p.finishId);
    if (main) pieces[p.id] = main;
    const accent = scene(p.accentFinishId);
    if (accent) pieceAccents[p.id] = accent;
  }
  return {
    floor: scene(doc.finishes.floor),
    ceiling: scene(doc.finishes.ceiling),
    walls: scene(doc.finishes.walls),
    wallOverrides,
    pieces,
    pieceAccents,
  };
}
