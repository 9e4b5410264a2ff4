// Tests for pieceSizeText: a piece's width × depth × height in centimetres, with one decimal place
// only where needed, rounded to the millimetre.
import { describe, expect, it } from 'vitest';
import { decimalCmText, pieceSizeText } from './piece-size';

describe('pieceSizeText', () => {
  it('writes width × depth × height in centimetres, one place only where it is needed', () => {
    expect(pieceSizeText({ width: 2000, depth: 900, height: 855 })).toBe('200 × 90 × 85.5 cm');
  });

  it('rounds to the millimetre, half a millimetre up', () => {
    expect(decimalCmText(854.4)).toBe('85.4');
    expect(decimalCmText(854.5)).toBe('85.5');
    // 100.05 cm is 100.04999… in binary: dividing first would round it down to 100.
    expect(decimalCmText(1000.5)).toBe('100.1');
  });
});
