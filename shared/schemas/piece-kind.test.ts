// Tests for piece kinds: a kind read from a stored value or from words in a name, the settings and
// accent fields each kind accepts, and version 1 plan files with older free-text kinds.
import { describe, expect, it } from 'vitest';
import { optionDocSchema } from './option';
import { kindFromWords, pieceKindSchema } from './piece-kind';
import { readPlanFile } from './plan-file';

const piece = (extra: Record<string, unknown>) => ({
  id: 'p',
  name: 'P',
  x: 0,
  y: 0,
  width: 500,
  depth: 500,
  height: 500,
  status: 'new',
  ...extra,
});

describe('piece kinds', () => {
  it('reads a kind from a stored value or a name by the words it contains, else plain-block', () => {
    expect(kindFromWords('sofa-3')).toBe('sofa');
    expect(kindFromWords('bed-double')).toBe('bed');
    expect(kindFromWords('sofa-corner')).toBe('corner-sofa');
    expect(kindFromWords('dining-table-6')).toBe('dining-set');
    expect(kindFromWords(undefined, 'Bedside table')).toBe('bedside-table');
    expect(kindFromWords(undefined, 'Double bed')).toBe('bed');
    expect(kindFromWords('hammock', 'Hammock')).toBe('plain-block');
    expect(kindFromWords('wardrobe')).toBe('wardrobe');
  });

  it('accepts the kinds, settings the kind takes and accent fields, and refuses the rest naming the field', () => {
    const ok = optionDocSchema.safeParse({
      pieces: [
        piece({ kind: 'corner-sofa', settings: { hand: 'left', arms: 'none' }, accentColour: '#334455', accentFinishId: 'f1' }),
      ],
    });
    expect(ok.success).toBe(true);
    const wrongKind = optionDocSchema.safeParse({ pieces: [piece({ kind: 'hammock' })] });
    expect(wrongKind.success).toBe(false);
    expect(wrongKind.error!.issues[0].path).toEqual(['pieces', 0, 'kind']);
    const wrongSetting = optionDocSchema.safeParse({
      pieces: [piece({ kind: 'rug' }), piece({ kind: 'wardrobe', settings: { hand: 'left' } })],
    });
    expect(wrongSetting.success).toBe(false);
    expect(wrongSetting.error!.issues[0]).toMatchObject({
      path: ['pieces', 1, 'settings', 'hand'],
      message: 'a wardrobe takes no hand',
    });
    const badCount = optionDocSchema.safeParse({ pieces: [piece({ kind: 'wardrobe', settings: { count: 40 } })] });
    expect(badCount.error!.issues[0].path).toEqual(['pieces', 0, 'settings', 'count']);
    const badAccent = optionDocSchema.safeParse({ pieces: [piece({ accentColour: 'brown' })] });
    expect(badAccent.error!.issues[0].path).toEqual(['pieces', 0, 'accentColour']);
    expect(pieceKindSchema.options).toContain('plain-block');
  });

  it('reads version 1 plan files with older free-text kinds, and the new settings and accents', () => {
    const file = {
      format: 'parlour-plan',
      version: 1,
      room: {
        name: 'R',
        outline: [
          [0, 0],
          [4000, 0],
          [4000, 3000],
          [0, 3000],
        ],
      },
      option: {
        name: 'A',
        pieces: [
          piece({ kind: 'sofa-3' }),
          piece({ id: 'q', kind: 'bed', settings: { footboard: true }, accentColour: '#112233' }),
        ],
      },
    };
    const read = readPlanFile(file);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.plan.option.pieces.map((p) => p.kind)).toEqual(['sofa', 'bed']);
    expect(read.plan.option.pieces[1]).toMatchObject({ settings: { footboard: true }, accentColour: '#112233' });
    const refused = readPlanFile({ ...file, option: { name: 'A', pieces: [piece({ kind: 'rug', settings: { chairs: 4 } })] } });
    expect(refused).toEqual({ ok: false, errors: ['option.pieces[0].settings.chairs: a rug takes no chairs'] });
  });
});
