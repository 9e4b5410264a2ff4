// Tests for the order the plan draws (and so hit-tests) its pieces in: rugs below the pieces
// standing on them, the rest in their own order (the browser test clicks the table on the rug).
import { describe, expect, it } from 'vitest';
import { pieceSchema, type Piece } from '../../../../../shared/schemas/option';
import { piecesInDrawOrder } from './piece-order';

const piece = (id: string, extra: Partial<Piece>): Piece =>
  pieceSchema.parse({ id, name: id, x: 2000, y: 1500, width: 1000, depth: 600, height: 420, status: 'new', ...extra });

// The rug comes after the coffee table in the option, as when it was added last.
const table = piece('coffee-table', { kind: 'coffee-table' });
const sofa = piece('sofa', { kind: 'sofa', y: 500, height: 850 });
const rug = piece('rug', { kind: 'rug', width: 2000, depth: 1400, height: 10 });
const mat = piece('mat', { width: 800, depth: 500, height: 8 });

describe('plan piece order', () => {
  // SVG paints later siblings over earlier ones, and a click goes to the topmost.
  it('puts pieces walked over first, keeping the order of the rest', () => {
    expect(piecesInDrawOrder([table, sofa, rug, mat]).map((p) => p.id)).toEqual(['rug', 'mat', 'coffee-table', 'sofa']);
    expect(piecesInDrawOrder([sofa, table]).map((p) => p.id)).toEqual(['sofa', 'coffee-table']);
  });
});
