// An option's finishes, read once for every place that needs them: which library finishes it uses,
// and what its surfaces and placed pieces wear in 3D (the editor's preview and the client's page).
// Holding-area pieces are the designer's working space: they are not drawn, so they wear nothing.
import type { Finish } from '../schemas/finish';
import type { OptionDoc } from '../schemas/option';
import { toSceneFinish, type SceneFinish } from './scene-finish';

/** What an option's surfaces and placed pieces wear: pieces and accents by piece id, feature walls by wall index. */
export interface OptionSurfaces {
  floor: SceneFinish | null;
  ceiling: SceneFinish | null;
  walls: SceneFinish | null;
  wallOverrides: Record<string, SceneFinish>;
  pieces: Record<string, SceneFinish>;
  pieceAccents: Record<string, SceneFinish>;
}

export interface OptionSurfacesOptions {
  /** Which texture of a photo finish: the standard one, or the large one for a full-screen view. */
  size?: 'standard' | 'large';
  /** Where a texture is loaded from, when not from its own URL (the client's link has its own file route). */
  textureUrl?: (url: string) => string;
}

/**
 * Every library finish id an option uses, once each, in the order met: floor, ceiling, walls,
 * feature walls, then each placed piece's main and accent finish.
 */
export function optionFinishIds(doc: OptionDoc): string[] {
  const { floor, ceiling, walls, wallOverrides } = doc.finishes;
  const ids = [
    floor,
    ceiling,
    walls,
    ...Object.values(wallOverrides),
    ...doc.pieces.filter((p) => p.placed).flatMap((p) => [p.finishId, p.accentFinishId]),
  ];
  return [...new Set(ids.filter((id): id is string => Boolean(id)))];
}

/** What an option's surfaces and placed pieces wear in 3D, from its finish ids and the studio's finishes; a missing finish wears nothing. */
export function optionSurfaces(
  doc: OptionDoc,
  finishes: ReadonlyMap<string, Finish>,
  opts: OptionSurfacesOptions = {},
): OptionSurfaces {
  const scene = (id: string | null | undefined): SceneFinish | null => {
    const finish = id ? finishes.get(id) : undefined;
    if (!finish) return null;
    const s = toSceneFinish(finish, { size: opts.size ?? 'standard' });
    return s.kind === 'photo' && opts.textureUrl ? { ...s, textureUrl: opts.textureUrl(s.textureUrl) } : s;
  };
  const wallOverrides: Record<string, SceneFinish> = {};
  for (const [wall, id] of Object.entries(doc.finishes.wallOverrides)) {
    const f = scene(id);
    if (f) wallOverrides[wall] = f;
  }
  const pieces: Record<string, SceneFinish> = {};
  const pieceAccents: Record<string, SceneFinish> = {};
  for (const piece of doc.pieces) {
    if (!piece.placed) continue;
    const main = scene(piece.finishId);
    if (main) pieces[piece.id] = main;
    const accent = scene(piece.accentFinishId);
    if (accent) pieceAccents[piece.id] = accent;
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
