// Which option each half of Compare shows: the halves stay where they are as the client selects
// one or the other; a third option takes the place of the half not selected.

/** The options shown side by side: [left, right], by id. */
export type Halves = readonly [string, string];

/** The halves when Compare opens: the selected option on the left, `other` (or the next option) on the right. */
export function openHalves(selectedId: string, optionIds: readonly string[], other?: string | null): Halves | null {
  const right = other && other !== selectedId && optionIds.includes(other) ? other : optionIds.find((id) => id !== selectedId);
  return right ? [selectedId, right] : null;
}

/**
 * The halves after the client shows `nextId` while `selectedId` was selected: unchanged when it is
 * already on one side; otherwise it replaces the half not selected, so the selected one stays put.
 */
export function halvesShowing(halves: Halves, selectedId: string, nextId: string): Halves {
  if (halves.includes(nextId)) return halves;
  return halves[0] === selectedId ? [halves[0], nextId] : [nextId, halves[1]];
}

/** The halves kept valid for the options there are, with the selected option on one side. */
export function settledHalves(halves: Halves | null, selectedId: string, optionIds: readonly string[]): Halves | null {
  if (!halves || !halves.every((id) => optionIds.includes(id)) || halves[0] === halves[1])
    return openHalves(selectedId, optionIds);
  return halvesShowing(halves, halves.includes(selectedId) ? selectedId : halves[0], selectedId);
}
