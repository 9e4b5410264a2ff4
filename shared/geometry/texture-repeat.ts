// How often a photo finish's texture repeats on a surface whose UVs are in scene metres.

/** The repeat size is real millimetres (the crop's width and height on the wall or floor). */
export interface RepeatSize {
  repeatWidthMm: number;
  repeatHeightMm: number;
}

const MM_PER_M = 1000;

/**
 * Texture repeats per metre of UV (scene UVs are metres): U along the texture's width, V along its
 * height. A 600 × 600 mm tile gives 1 / 0.6 repeats per metre both ways.
 */
export function textureRepeat(finish: RepeatSize): { repeatU: number; repeatV: number } {
  if (!(finish.repeatWidthMm > 0) || !(finish.repeatHeightMm > 0)) {
    throw new RangeError(`A repeat size must be more than 0 mm (got ${finish.repeatWidthMm} × ${finish.repeatHeightMm}).`);
  }
  return { repeatU: MM_PER_M / finish.repeatWidthMm, repeatV: MM_PER_M / finish.repeatHeightMm };
}

/**
 * Where a point `uM` metres along the surface lands in the texture, as a fraction 0…1 of its width
 * (the same sampling a repeat-wrapped texture does: fract(u × repeat)).
 */
export function textureFraction(uM: number, repeatPerM: number): number {
  const t = uM * repeatPerM;
  return t - Math.floor(t);
}
