/**
 * The item at an index that the caller knows is there (a wall index from a validated room, the
 * first point of an outline): the item, typed without `undefined`, or a RangeError naming what was
 * missing. Hot typed-array loops whose indices are in range by construction use `!` instead.
 */
export function itemAt<T>(list: ArrayLike<T>, index: number, what = 'item'): T {
  const item = list[index];
  if (item === undefined) throw new RangeError(`No ${what} at index ${index} (of ${list.length}).`);
  return item;
}
