// Tests for piece labels on the plan: contrast measured the way WCAG 2.x defines it, dark or light
// text by the piece's colour, and where the label sits.
import { describe, expect, it } from 'vitest';
import { LABEL_DARK, LABEL_LIGHT, contrastRatio, labelColourOn, labelLayout, labelWidth, relativeLuminance } from './piece-look';

describe('piece labels on the plan', () => {
  it('measures contrast as WCAG 2.x does', () => {
    // WCAG 2.x: black on white is 21:1, a colour on itself 1:1; white's luminance is 1, black's 0.
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 9);
    expect(contrastRatio('#777777', '#777777')).toBeCloseTo(1, 9);
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 9);
    // #767676 on white is the well-known lightest grey passing 4.5:1 (4.54:1).
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });

  it('writes dark on light pieces and light on dark ones, always at least 4.5:1 on the plan’s colours', () => {
    expect(labelColourOn('#ffffff')).toBe(LABEL_DARK);
    expect(labelColourOn('#d8cdbd')).toBe(LABEL_DARK);
    expect(labelColourOn('#2f4858')).toBe(LABEL_LIGHT);
    expect(labelColourOn('#5b4636')).toBe(LABEL_LIGHT);
    for (const fill of ['#ffffff', '#ece4d6', '#8a6a4f', '#2f4858', '#5b4636', '#a3ad94', '#000000'])
      expect(contrastRatio(fill, labelColourOn(fill))).toBeGreaterThanOrEqual(4.5);
  });

  it('keeps the label inside a piece it fits, and puts it beside one too small to read it in', () => {
    const text = 120;
    const sofa = { x: 1000, y: 1000, width: 2100, depth: 900, rotation: 180, name: 'Three-seat sofa' };
    const inside = labelLayout(sofa, text);
    expect(inside.inside).toBe(true);
    expect(labelWidth(sofa.name, inside.size)).toBeLessThanOrEqual(sofa.width);
    expect(inside.size).toBeLessThanOrEqual(sofa.depth);
    expect(Math.abs(inside.angle)).toBeLessThanOrEqual(90);
    const lamp = { x: 1000, y: 1000, width: 300, depth: 300, rotation: 0, name: 'Table lamp with a long name' };
    const beside = labelLayout(lamp, text);
    expect(beside.inside).toBe(false);
    expect(beside.at[1]).toBeGreaterThan(lamp.y + lamp.depth / 2);
    const tall = labelLayout({ ...sofa, width: 600, depth: 1800, rotation: 90 }, text);
    expect(tall.inside).toBe(true);
    expect(labelWidth(sofa.name, tall.size)).toBeLessThanOrEqual(1800);
  });
});
