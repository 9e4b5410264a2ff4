// Tests for changing a piece's kind, its kind settings and its accent colour and finish through
// updatePiece.
import { describe, expect, it } from 'vitest';
import { updatePiece } from './piece-commands';
import { applied, refusal, sampleDoc } from '../../tests/fixtures/commands';

const chair = (doc: ReturnType<typeof sampleDoc>) => doc.options['opt-a'].pieces.find((p) => p.id === 'chair')!;

describe('changing a piece’s kind, settings and accent', () => {
  it('sets the kind and its settings, and a new kind drops the old kind’s settings', () => {
    let doc = applied(sampleDoc(), updatePiece('opt-a', 'chair', { kind: 'sofa', settings: { arms: 'none' } }));
    expect(chair(doc)).toMatchObject({ kind: 'sofa', settings: { arms: 'none' } });
    doc = applied(doc, updatePiece('opt-a', 'chair', { kind: 'wardrobe' }));
    expect(chair(doc).kind).toBe('wardrobe');
    expect(chair(doc).settings).toBeUndefined();
  });

  it('sets and clears the accent colour and finish, and refuses a colour that is not one', () => {
    let doc = applied(sampleDoc(), updatePiece('opt-a', 'chair', { accentColour: '#5b4636', accentFinishId: 'f-oak' }));
    expect(chair(doc)).toMatchObject({ accentColour: '#5b4636', accentFinishId: 'f-oak' });
    doc = applied(doc, updatePiece('opt-a', 'chair', { accentColour: null, accentFinishId: null }));
    expect(chair(doc).accentColour).toBeUndefined();
    expect(chair(doc).accentFinishId).toBeNull();
    expect(refusal(sampleDoc(), updatePiece('opt-a', 'chair', { accentColour: 'brown' }))).toMatch(/colour/);
    expect(refusal(sampleDoc(), updatePiece('opt-a', 'chair', { kind: 'hammock' as never }))).toMatch(/kind/);
  });
});
