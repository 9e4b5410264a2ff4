// The editor's screen arrangement: the divider's limits and the remembered length unit.
import { describe, expect, it } from 'vitest';
import { clampSplit, SPLIT_MAX, SPLIT_MIN, storedUnit } from './use-editor-view';

describe('editor view', () => {
  it('keeps the divider between its limits', () => {
    expect(clampSplit(0.5)).toBe(0.5);
    expect(clampSplit(0.05)).toBe(SPLIT_MIN);
    expect(clampSplit(1.3)).toBe(SPLIT_MAX);
  });

  it('reads a stored unit, and falls back to centimetres for nothing or something unknown', () => {
    expect(storedUnit('mm')).toBe('mm');
    expect(storedUnit('ftin')).toBe('ftin');
    expect(storedUnit(null)).toBe('cm');
    expect(storedUnit('furlong')).toBe('cm');
  });
});
