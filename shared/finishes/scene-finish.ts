// What the 3D views need to draw a finish: a plain colour or a repeating texture, and how rough.
import type { Finish, FinishCategory, PhotoFinish, Sheen } from '../schemas/finish';

export type SceneFinish =
  | { kind: 'paint'; colourHex: string; roughness: number }
  | {
      kind: 'photo';
      textureUrl: string;
      repeatWidthMm: number;
      repeatHeightMm: number;
      roughness: number;
      meanColourHex: string;
    };

// Physically based roughness (0 mirror-smooth … 1 fully diffuse). Chosen by eye against how these
// surfaces look in daylight: common practice in real-time rendering, no published source.
export const PAINT_ROUGHNESS: Record<Sheen, number> = { matt: 0.92, eggshell: 0.78, satin: 0.6, gloss: 0.32 };
export const PHOTO_ROUGHNESS: Record<FinishCategory, number> = {
  fabric: 0.95,
  wallpaper: 0.88,
  wall: 0.88,
  wood: 0.62,
  floor: 0.62,
  stone: 0.55,
  tile: 0.38,
  other: 0.75,
};

/** Drawn while a photo finish has no texture yet (still processing, or failed). */
export const PENDING_COLOUR_HEX = '#c8c2b8';

/**
 * Maps a finish to its scene material. A photo finish without a texture yet comes back as a plain
 * colour (its mean colour once known), so a surface is never left undrawn. `size: 'large'` picks
 * the 2048 px texture (presentations), the default the 1024 px one (editor preview).
 */
export function toSceneFinish(finish: Finish, opts: { size?: 'standard' | 'large' } = {}): SceneFinish {
  if (finish.kind === 'paint') return { kind: 'paint', colourHex: finish.colourHex, roughness: PAINT_ROUGHNESS[finish.sheen] };
  const roughness = PHOTO_ROUGHNESS[finish.category];
  const url = pickTexture(finish, opts.size ?? 'standard');
  if (finish.status !== 'ready' || !url) {
    return { kind: 'paint', colourHex: finish.meanColourHex ?? PENDING_COLOUR_HEX, roughness };
  }
  return {
    kind: 'photo',
    textureUrl: url,
    repeatWidthMm: finish.repeatWidthMm,
    repeatHeightMm: finish.repeatHeightMm,
    roughness,
    meanColourHex: finish.meanColourHex ?? PENDING_COLOUR_HEX,
  };
}

function pickTexture(finish: PhotoFinish, size: 'standard' | 'large'): string | null {
  return size === 'large' ? (finish.files.textureLargeUrl ?? finish.files.textureUrl) : finish.files.textureUrl;
}
