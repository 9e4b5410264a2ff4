// Tests for an option's schedule lines: identical pieces grouped, existing pieces at no cost, held
// pieces left out, paint priced by its tins, boards by full boxes, per-unit finishes.
import { describe, expect, it } from 'vitest';
import { optionDocSchema } from '../schemas/option';
import { buildSchedule } from './schedule-lines';
import { shell, library, defaults, piece } from './test-rooms';
import { takeoffSettingsSchema } from './takeoff-settings';

describe('buildSchedule', () => {
  it('groups identical pieces, lists existing ones at no cost and leaves held pieces out', () => {
    const doc = optionDocSchema.parse({
      pieces: [
        piece({ id: 'c1', price: 120, supplierUrl: 'https://example.com/chair' }),
        piece({ id: 'c2', price: 120, x: 2000 }),
        piece({ id: 'c3', price: 150, x: 3000 }),
        piece({ id: 'sofa', name: 'Sofa', width: 2000, depth: 900, status: 'existing', price: 900 }),
        piece({ id: 'lamp', name: 'Lamp', price: 80, placed: false }),
        piece({ id: 'stool', name: 'Stool', price: null }),
      ],
    });
    const s = buildSchedule(shell, doc, library, defaults);
    const chairs = s.lines.filter((l) => l.name === 'Chair');
    expect(chairs.map((l) => [l.quantity, l.unitPrice, l.total])).toEqual([
      [2, 120, 240],
      [1, 150, 150],
    ]);
    expect(chairs[0].supplierUrl).toBe('https://example.com/chair');
    expect(s.lines.find((l) => l.name === 'Sofa')).toMatchObject({ status: 'existing', total: 0, unitPrice: null });
    expect(s.lines.find((l) => l.name === 'Stool')).toMatchObject({ total: null, unpricedReason: expect.any(String) });
    expect(s.heldPieceCount).toBe(1);
    expect(s.totals).toEqual({
      newPiecesCost: 390,
      finishesCost: 0,
      budget: 390,
      newPieceCount: 4,
      existingPieceCount: 1,
      unpricedCount: 1,
    });
  });

  it('prices paint by the litres in its tins, and boards by the full boxes bought', () => {
    const doc = optionDocSchema.parse({ finishes: { floor: 'boards', walls: 'oat' } });
    const s = buildSchedule(shell, doc, library, takeoffSettingsSchema.parse({ unitCoverageM2: { boards: 2.5 } }));
    const [floor, paint] = s.lines;
    // 13.2 m² → 6 boxes of 2.5 m² = 15 m² × 50 = 750
    expect(floor).toMatchObject({
      name: 'Boards',
      quantity: 15,
      quantityUnit: 'm2',
      total: 750,
      quantityNote: '6 × 2.5 m² for 13.2 m² with 10 % waste',
    });
    // 33 m² × 2 ÷ 10 = 6.6 L; 5 + 0.75 + 0.75 = 6.5 L is short, 5 + 1 + 0.75 = 6.75 L is the least above: × 20 = 135
    expect(paint).toMatchObject({
      quantity: 6.75,
      quantityUnit: 'L',
      total: 135,
      quantityNote: '5 L + 1 L + 0.75 L for 6.6 L',
      colourHex: '#e6dcc8',
    });
    expect(s.totals.budget).toBe(885);
  });

  it('prices a per-unit finish only when what one unit covers is known', () => {
    const doc = optionDocSchema.parse({ finishes: { walls: 'paper' } });
    const unknown = buildSchedule(shell, doc, library, defaults).lines[0];
    expect(unknown).toMatchObject({
      total: null,
      quantityUnit: 'm2',
      unpricedReason: 'Priced per box or roll: enter what one covers.',
    });
    const known = buildSchedule(shell, doc, library, takeoffSettingsSchema.parse({ unitCoverageM2: { paper: 5.3 } })).lines[0];
    // 33 m² + 10 % = 36.3 m² ÷ 5.3 = 6.85 → 7 rolls × 30
    expect(known).toMatchObject({ quantity: 7, quantityUnit: 'unit', total: 210 });
  });
});
