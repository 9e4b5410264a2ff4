// Tests for an option's surfaces: the finish ids it uses, listed once, and the finish each surface,
// feature wall and placed piece wears, with missing finishes and held pieces wearing nothing.
import { describe, expect, it } from 'vitest';
import type { Finish, PaintFinish, PhotoFinish } from '../schemas/finish';
import { optionDocSchema } from '../schemas/option';
import { optionFinishIds, optionSurfaces } from './option-surfaces';
import { PAINT_ROUGHNESS } from './scene-finish';

const base = {
  supplier: null,
  code: null,
  price: null,
  priceUnit: null,
  createdAt: '2025-01-01T00:00:00Z',
  updatedAt: '2025-01-01T00:00:00Z',
};
const sage: PaintFinish = { ...base, id: 'sage', name: 'Sage', kind: 'paint', colourHex: '#9aa58c', sheen: 'matt' };
const clay: PaintFinish = { ...base, id: 'clay', name: 'Clay', kind: 'paint', colourHex: '#b5724f', sheen: 'gloss' };
const oak: PhotoFinish = {
  ...base,
  id: 'oak',
  name: 'Oak boards',
  kind: 'photo',
  category: 'wood',
  repeatWidthMm: 1200,
  repeatHeightMm: 180,
  crop: { x: 0, y: 0, width: 1, height: 1 },
  edgeBlend: 'none',
  status: 'ready',
  failureReason: null,
  meanColourHex: '#a07850',
  photoWidthPx: 1000,
  photoHeightPx: 1000,
  files: {
    swatchUrl: '/api/files/s.webp',
    textureUrl: '/api/files/t.webp',
    textureLargeUrl: '/api/files/t-large.webp',
    previewUrl: null,
    photoUrl: null,
  },
};
const library = new Map<string, Finish>([sage, clay, oak].map((f) => [f.id, f]));
const box = { x: 1000, y: 1000, width: 500, depth: 500, height: 500, status: 'new' as const };
const doc = optionDocSchema.parse({
  finishes: { floor: 'oak', walls: 'sage', ceiling: 'gone', wallOverrides: { '2': 'clay', '3': 'sage' } },
  pieces: [
    { ...box, id: 'chair', name: 'Chair', finishId: 'clay', accentFinishId: 'oak' },
    { ...box, id: 'held', name: 'Held', placed: false, finishId: 'kept-aside', accentFinishId: 'kept-aside-too' },
  ],
});

describe('optionFinishIds', () => {
  it('lists every finish an option uses once, surfaces first, then placed pieces; held pieces use none', () => {
    expect(optionFinishIds(doc)).toEqual(['oak', 'gone', 'sage', 'clay']);
  });
});

describe('optionSurfaces', () => {
  it('dresses the surfaces, feature walls and placed pieces; a finish no longer in the library and a held piece wear nothing', () => {
    const s = optionSurfaces(doc, library);
    expect(s.floor).toMatchObject({ kind: 'photo', textureUrl: '/api/files/t.webp', repeatWidthMm: 1200 });
    expect(s.walls).toEqual({ kind: 'paint', colourHex: '#9aa58c', roughness: PAINT_ROUGHNESS.matt });
    expect(s.ceiling).toBeNull();
    expect(Object.keys(s.wallOverrides)).toEqual(['2', '3']);
    expect(s.wallOverrides['2']).toMatchObject({ colourHex: '#b5724f' });
    expect(s.pieces).toEqual({ chair: { kind: 'paint', colourHex: '#b5724f', roughness: PAINT_ROUGHNESS.gloss } });
    expect(Object.keys(s.pieceAccents)).toEqual(['chair']);
  });

  it('takes the large texture and loads it from elsewhere when asked', () => {
    const s = optionSurfaces(doc, library, { size: 'large', textureUrl: (url) => url.replace('/api/files/', '/link/') });
    expect(s.floor).toMatchObject({ textureUrl: '/link/t-large.webp' });
    expect(s.pieceAccents.chair).toMatchObject({ textureUrl: '/link/t-large.webp' });
    expect(s.walls).toMatchObject({ kind: 'paint' });
  });
});
