// The editor's remembered place: what a stored value may bring back, and what it falls back to.
import { describe, expect, it } from 'vitest';
import { DEFAULT_WALKWAY_MM } from '../../../../shared/analysis/fit/clearances';
import { openingPlace, parsePlace } from './use-editor-place';

describe('the editor place remembered in the browser', () => {
  it('reads back a stored step, option and walkway', () => {
    const stored = parsePlace(JSON.stringify({ step: 'check', optionId: 'o2', walkwayMm: 1100 }));
    expect(openingPlace(stored, ['o1', 'o2'], false)).toEqual({ step: 'check', optionId: 'o2', walkwayMm: 1100 });
  });

  it('drops each field that no longer makes sense on its own, keeping the rest', () => {
    const stored = parsePlace(JSON.stringify({ step: 'paint', optionId: 'gone', walkwayMm: 5000 }));
    expect(stored).toEqual({ step: undefined, optionId: 'gone', walkwayMm: undefined });
    // The option was deleted since: the first option opens instead.
    expect(openingPlace(stored, ['o1', 'o2'], false)).toEqual({ step: 'outline', optionId: 'o1', walkwayMm: DEFAULT_WALKWAY_MM });
  });

  it('treats nothing stored, broken JSON and a non-object alike, and opens a viewer on Furnish', () => {
    for (const raw of [null, '{not json', '42', 'null']) {
      expect(openingPlace(parsePlace(raw), ['o1'], true)).toEqual({
        step: 'furnish',
        optionId: 'o1',
        walkwayMm: DEFAULT_WALKWAY_MM,
      });
    }
    expect(openingPlace(null, [], false).optionId).toBe('');
  });
});
