import { describe, expect, it } from 'vitest';
import { toCsv } from './csv';

describe('toCsv', () => {
  it('quotes only what needs it, doubles quotes and ends records with CRLF', () => {
    expect(toCsv([['a', 'b, c', 'say "hi"'], ['two\nlines', 1.5, null]])).toBe('a,"b, c","say ""hi"""\r\n"two\nlines",1.5,\r\n');
  });

  it('pads short records and defuses formulas in text but not in numbers', () => {
    expect(toCsv([['x', 'y', 'z'], ['=SUM(A1)', -2]])).toBe("x,y,z\r\n'=SUM(A1),-2,\r\n");
    expect(toCsv([['@cmd', '+1', 'fine']])).toBe("'@cmd,'+1,fine\r\n");
  });
});
