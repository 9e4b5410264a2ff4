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
  type CatalogueKind,
} from './catalogue';

describe('catalogue', () => {
  it('has one entry per kind, each sized, grouped and sourced', () => {
    const kinds = CATALOGUE.map((e) => e.kind);
    expect(new Set(kinds).size).toBe(kinds.length);
    for (const entry of CATALOGUE) {
      expect(entry.width * entry.depth * entry.height).toBeGreaterThan(0);
      expect(CATALOGUE_GROUPS).toContain(entry.group);
      expect(entry.source.length).toBeGreaterThan(10);
      if (!('mattress' in entry)) expect(entry.source).toContain('common practice');
    }
  });

  it('covers what a designer starts a living room, bedroom or dining room with', () => {
    const wanted: CatalogueKind[] = [
      'sofa-2-seat', 'sofa-3-seat', 'sofa-corner', 'armchair', 'coffee-table', 'side-table', 'bedside-table', 'wardrobe',
      'chest-of-drawers', 'desk', 'dining-table-4', 'dining-table-6', 'bookcase', 'tv-unit', 'sideboard', 'rug', 'wall-cabinet', 'custom-box',
    ];
    for (const kind of wanted) expect(catalogueEntry(kind).kind).toBe(kind);
    expect(CATALOGUE.filter((e) => e.group === 'beds').length).toBe(15);
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
      id: 'cab-1', name: 'Wall cabinet', kind: 'wall-cabinet', x: 1200, y: 40, width: 800, depth: 350, height: 700,
      rotation: 0, elevation: 1400, status: 'new', placed: true,
    });
    expect(pieceSchema.parse(piece)).toEqual(piece);
    expect(pieceFromCatalogue('sofa-3-seat', 's', [0, 0]).elevation).toBe(0);
  });

  it('throws for a kind the catalogue does not have', () => {
    expect(() => pieceFromCatalogue('hammock' as CatalogueKind, 'h', [0, 0])).toThrow('The catalogue has no hammock.');
  });
});
