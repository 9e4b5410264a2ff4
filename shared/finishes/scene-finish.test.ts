// Tests for toSceneFinish: a paint's colour and roughness by sheen, a ready photo finish's texture
// and real repeat size, and a photo still processing drawn as a plain colour.
import { describe, expect, it } from 'vitest';
import type { PaintFinish, PhotoFinish } from '../schemas/finish';
import { PAINT_ROUGHNESS, PENDING_COLOUR_HEX, PHOTO_ROUGHNESS, toSceneFinish } from './scene-finish';

const base = {
  supplier: null,
  code: null,
  price: null,
  priceUnit: null,
  createdAt: '2025-01-01T00:00:00Z',
  updatedAt: '2025-01-01T00:00:00Z',
};
const paint: PaintFinish = { ...base, id: 'p', name: 'Sage hall', kind: 'paint', colourHex: '#9aa58c', sheen: 'matt' };
const photo: PhotoFinish = {
  ...base,
  id: 't',
  name: 'Grey stone',
  kind: 'photo',
  category: 'tile',
  repeatWidthMm: 600,
  repeatHeightMm: 600,
  crop: { x: 0, y: 0, width: 1, height: 1 },
  edgeBlend: 'none',
  status: 'ready',
  failureReason: null,
  meanColourHex: '#8a8a88',
  photoWidthPx: 1000,
  photoHeightPx: 1000,
  files: {
    swatchUrl: '/api/files/a.webp',
    textureUrl: '/api/files/b.webp',
    textureLargeUrl: '/api/files/c.webp',
    previewUrl: null,
    photoUrl: null,
  },
};

describe('toSceneFinish', () => {
  it('gives a paint its colour and a roughness by sheen: matt rougher than gloss', () => {
    expect(toSceneFinish(paint)).toEqual({ kind: 'paint', colourHex: '#9aa58c', roughness: PAINT_ROUGHNESS.matt });
    expect(PAINT_ROUGHNESS.matt).toBeGreaterThan(PAINT_ROUGHNESS.eggshell);
    expect(PAINT_ROUGHNESS.satin).toBeGreaterThan(PAINT_ROUGHNESS.gloss);
  });

  it('gives a ready photo its texture and real repeat size; fabric is rougher than tile', () => {
    expect(toSceneFinish(photo)).toEqual({
      kind: 'photo',
      textureUrl: '/api/files/b.webp',
      repeatWidthMm: 600,
      repeatHeightMm: 600,
      roughness: PHOTO_ROUGHNESS.tile,
      meanColourHex: '#8a8a88',
    });
    expect(toSceneFinish(photo, { size: 'large' })).toMatchObject({ textureUrl: '/api/files/c.webp' });
    expect(PHOTO_ROUGHNESS.fabric).toBeGreaterThan(PHOTO_ROUGHNESS.tile);
  });

  it('draws a photo still processing as a plain colour', () => {
    const pending = {
      ...photo,
      status: 'processing' as const,
      meanColourHex: null,
      files: { ...photo.files, textureUrl: null, textureLargeUrl: null },
    };
    expect(toSceneFinish(pending)).toEqual({ kind: 'paint', colourHex: PENDING_COLOUR_HEX, roughness: PHOTO_ROUGHNESS.tile });
  });
});
