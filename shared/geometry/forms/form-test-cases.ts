// What the forms tests try every kind with: a seeded random source (the same boxes every run) and
// each setting's values; shared by forms.test.ts and mesh-digest.test.ts.

/** A seeded random source in [0, 1) (a linear congruential generator, Numerical Recipes' constants). */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/** Every value each kind setting takes in the tests. */
export const SETTING_VALUES: Record<string, unknown[]> = {
  arms: ['both', 'none'],
  base: ['legs', 'plinth'],
  hand: ['left', 'right'],
  top: ['rectangular', 'round'],
  fronts: ['doors', 'drawers'],
  count: [1, 3, 5],
  chairs: [2, 4, 6, 8],
  headboardHeight: [600, 1200],
  footboard: [true, false],
};
