// Tests for which option each half of Compare shows: halves kept as the client selects either one,
// a third option replacing the half not selected.
import { describe, expect, it } from 'vitest';
import { halvesShowing, openHalves, settledHalves } from './compare-halves';

const ids = ['a', 'b', 'c'];

describe('Compare halves', () => {
  it('opens with the selected option on the left and the next one, or the one asked for, on the right', () => {
    expect(openHalves('b', ids)).toEqual(['b', 'a']);
    expect(openHalves('a', ids, 'c')).toEqual(['a', 'c']);
    expect(openHalves('a', ids, 'a')).toEqual(['a', 'b']);
    expect(openHalves('a', ['a'])).toBeNull();
  });

  it('keeps the halves where they are when the client selects the other option', () => {
    expect(halvesShowing(['a', 'b'], 'a', 'b')).toEqual(['a', 'b']);
    expect(halvesShowing(['a', 'b'], 'b', 'a')).toEqual(['a', 'b']);
  });

  it('puts a third option in the half not selected', () => {
    expect(halvesShowing(['a', 'b'], 'a', 'c')).toEqual(['a', 'c']);
    expect(halvesShowing(['a', 'b'], 'b', 'c')).toEqual(['c', 'b']);
  });

  it('settles halves naming options that are gone', () => {
    expect(settledHalves(['a', 'x'], 'a', ids)).toEqual(['a', 'b']);
    expect(settledHalves(null, 'c', ids)).toEqual(['c', 'a']);
    expect(settledHalves(['a', 'b'], 'b', ids)).toEqual(['a', 'b']);
    expect(settledHalves(['a', 'b'], 'c', ids)).toEqual(['a', 'c']);
  });
});
