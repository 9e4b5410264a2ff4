// Tests a piece's accent finish on the client's link: which finishes' files the link may serve,
// and what the 3D view and the client piece are given.
import { describe, expect, it } from 'vitest';
import { clientSurfaces, toClientPiece } from '../../server/features/presentations/presentations.service';
import { optionFinishIds } from '../../shared/finishes/option-surfaces';
import type { Finish } from '../../shared/schemas/finish';
import { optionDocSchema } from '../../shared/schemas/option';

const MAIN = '11111111-1111-4111-8111-111111111111';
const ACCENT = '22222222-2222-4222-8222-222222222222';
const paint = (id: string, colourHex: string) => ({ id, kind: 'paint', name: id, colourHex, sheen: 'matt' }) as unknown as Finish;

describe('accent finishes on the client’s link', () => {
  const doc = optionDocSchema.parse({
    pieces: [
      {
        id: 'table',
        name: 'Table',
        kind: 'dining-table',
        x: 1000,
        y: 1000,
        width: 1600,
        depth: 900,
        height: 740,
        status: 'new',
        finishId: MAIN,
        accentFinishId: ACCENT,
        accentColour: '#5b4636',
      },
      {
        id: 'held',
        name: 'Held',
        x: 0,
        y: 0,
        width: 500,
        depth: 500,
        height: 500,
        status: 'new',
        placed: false,
        accentFinishId: '33333333-3333-4333-8333-333333333333',
      },
    ],
  });

  it('counts a placed piece’s accent finish among the finishes whose files the link may serve; a held piece’s not', () => {
    expect(optionFinishIds(doc).sort()).toEqual([MAIN, ACCENT].sort());
  });

  it('gives the 3D view the accent as a scene finish by piece id, and the client piece its kind and accent colour but no finish id', () => {
    const finishes = new Map([
      [MAIN, paint(MAIN, '#d8cdbd')],
      [ACCENT, paint(ACCENT, '#3d342c')],
    ]);
    const surfaces = clientSurfaces(doc, finishes, 'token');
    expect(surfaces.pieces.table).toMatchObject({ kind: 'paint', colourHex: '#d8cdbd' });
    expect(surfaces.pieceAccents?.table).toMatchObject({ kind: 'paint', colourHex: '#3d342c' });
    const client = toClientPiece(doc.pieces[0], false, new Map());
    expect(client).toMatchObject({ kind: 'dining-table', accentColour: '#5b4636' });
    expect(JSON.stringify(client)).not.toContain(ACCENT);
  });
});
