// Tests for the catalogue: one sized, grouped and sourced entry per id, the starting pieces for a
// living room, bedroom or dining room, beds built round their mattress, and pieceFromCatalogue.
import { describe, expect, it } from 'vitest';
import { pieceSchema } from '../schemas/option';
import {
  BED_FRAME_LENGTH_ALLOWANCE_MM,
  BED_FRAME_WIDTH_ALLOWANCE_MM,
  CATALOGUE,
  CATALOGUE_GROUPS,
  WALL_CABINET_ELEVATION_MM,
  catalogueEntry,
  pieceFromCatalogue,
  type CatalogueId,
} from './catalogue';
import { KIND_SETTINGS, PIECE_KINDS } from '../schemas/piece-kind';

describe('catalogue', () => {
  it('has one entry per id, each sized, grouped, sourced and of a kind whose settings it may take', () => {
    const ids = CATALOGUE.map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const entry of CATALOGUE) {
      expect(PIECE_KINDS).toContain(entry.kind);
      for (const key of Object.keys(entry.settings ?? {})) expect(KIND_SETTINGS[entry.kind]).toContain(key);
    }
    for (const entry of CATALOGUE) {
      expect(entry.width * entry.depth * entry.height).toBeGreaterThan(0);
      expect(CATALOGUE_GROUPS).toContain(entry.group);
      expect(entry.source.length).toBeGreaterThan(10);
      if (!('mattress' in entry)) expect(entry.source).toContain('common practice');
    }
  });

  it('covers what a designer starts a living room, bedroom or dining room with', () => {
    const wanted: CatalogueId[] = [
      'sofa-2-seat',
      'sofa-3-seat',
      'sofa-corner',
      'armchair',
      'coffee-table',
      'side-table',
      'bedside-table',
      'wardrobe',
      'chest-of-drawers',
      'desk',
      'dining-table-4',
      'dining-table-6',
      'bookcase',
      'tv-unit',
      'sideboard',
      'rug',
      'wall-cabinet',
      'custom-box',
    ];
    for (const id of wanted) expect(catalogueEntry(id).id).toBe(id);
    expect(catalogueEntry('sofa-3-seat').kind).toBe('sofa');
    expect(catalogueEntry('dining-table-4').kind).toBe('dining-set');
    expect(catalogueEntry('bed-us-queen').kind).toBe('bed');
    expect(catalogueEntry('custom-box').kind).toBe('plain-block');
    expect(CATALOGUE.filter((e) => e.kind === 'bed').length).toBe(15);
    // Every kind has at least one entry to add it from.
    for (const kind of PIECE_KINDS) expect(CATALOGUE.some((e) => e.kind === kind)).toBe(true);
  });

  it('builds beds round their mattress with the frame allowance', () => {
    const king = catalogueEntry('bed-uk-king');
    expect([king.width, king.depth]).toEqual([1500 + BED_FRAME_WIDTH_ALLOWANCE_MM, 2000 + BED_FRAME_LENGTH_ALLOWANCE_MM]);
    expect(king.source).toContain('National Bed Federation');
    expect(king.source).toContain('frame allowance and height: common practice');
  });

  it('keeps a rug flat and hangs a wall cabinet', () => {
    expect(catalogueEntry('rug').height).toBe(10);
    expect(catalogueEntry('wall-cabinet').elevation).toBe(WALL_CABINET_ELEVATION_MM);
    expect(WALL_CABINET_ELEVATION_MM).toBe(1400);
  });
});

describe('pieceFromCatalogue', () => {
  it('makes a new placed piece at the point, sized from its entry, that the piece schema accepts', () => {
    const piece = pieceFromCatalogue('wall-cabinet', 'cab-1', [1200, 40]);
    expect(piece).toEqual({
      id: 'cab-1',
      name: 'Wall cabinet',
      kind: 'wall-cabinet',
      x: 1200,
      y: 40,
      width: 800,
      depth: 350,
      height: 700,
      rotation: 0,
      elevation: 1400,
      status: 'new',
      placed: true,
    });
    expect(pieceSchema.parse(piece)).toEqual(piece);
    expect(pieceFromCatalogue('sofa-3-seat', 's', [0, 0]).elevation).toBe(0);
  });

  it('throws for an id the catalogue does not have', () => {
    expect(() => pieceFromCatalogue('hammock' as CatalogueId, 'h', [0, 0])).toThrow('The catalogue has no hammock.');
  });
});
