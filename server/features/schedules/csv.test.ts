// Tests the CSV writer (quoting, CRLF, short records, formulas defused) and that a schedule's CSV
// writes web links only.
import { describe, expect, it } from 'vitest';
import { toCsv } from './csv';

describe('toCsv', () => {
  it('quotes only what needs it, doubles quotes and ends records with CRLF', () => {
    expect(
      toCsv([
        ['a', 'b, c', 'say "hi"'],
        ['two\nlines', 1.5, null],
      ]),
    ).toBe('a,"b, c","say ""hi"""\r\n"two\nlines",1.5,\r\n');
  });

  it('pads short records and defuses formulas in text but not in numbers', () => {
    expect(
      toCsv([
        ['x', 'y', 'z'],
        ['=SUM(A1)', -2],
      ]),
    ).toBe("x,y,z\r\n'=SUM(A1),-2,\r\n");
    expect(toCsv([['@cmd', '+1', 'fine']])).toBe("'@cmd,'+1,fine\r\n");
  });
});

describe('scheduleCsv', () => {
  it('writes web links only, whatever the schedule line holds', async () => {
    const { scheduleCsv } = await import('./schedules.service');
    const line = (name: string, supplierUrl: string) => ({
      section: 'piece',
      name,
      status: 'new',
      sizeMm: null,
      detail: null,
      quantity: 1,
      quantityUnit: 'piece',
      quantityNote: null,
      unitPrice: 10,
      priceUnit: null,
      total: 10,
      supplier: null,
      code: null,
      supplierUrl,
    });
    const answer = {
      schedule: {
        lines: [
          line('Safe', 'https://supplier.example/a'),
          line('Script', 'javascript:alert(1)'),
          line('Data', 'data:text/html,<b>x</b>'),
        ],
        totals: { newPiecesCost: 30, finishesCost: 0, budget: 30 },
      },
    } as unknown as Parameters<typeof scheduleCsv>[0];
    const csv = scheduleCsv(answer);
    expect(csv).toContain('https://supplier.example/a');
    expect(csv).not.toMatch(/javascript|data:/);
  });
});
