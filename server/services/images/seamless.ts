// Makes a texture repeat without a visible seam by blending each edge band with its mirror image
// across the seam.
//
// Method: copies of a texture meet where its right edge touches the next copy's left edge (and
// bottom meets top). Within a band of `bandPx` on each side of that seam, a pixel at distance d
// from the seam is mixed with the pixel at the same distance on the other side: 50/50 right at the
// seam, easing (smoothstep) to the untouched photo at d = bandPx. Both sides of the seam then hold
// the same values, mirrored, so copies join without a step; the middle of the texture is untouched
// and the texture keeps its size, so the real repeat size still holds. An edge that is already
// symmetric (a tile cut through the middle of its grout) comes out unchanged. Columns are done
// first, then rows; blending rows keeps each row's left-right join, so corners join too.

/** The weight of a pixel's own value at distance `d` pixels from the seam (0.5 at the seam, 1 beyond the band). */
function ownWeight(d: number, bandPx: number): number {
  const t = Math.min(1, (d + 0.5) / bandPx);
  return 0.5 + 0.5 * t * t * (3 - 2 * t);
}

/**
 * Blends the edges of an interleaved 8-bit image in place (`channels` values per pixel, rows top
 * to bottom). `bandFraction` is the band's width as a fraction of each side; 0 leaves it as it is.
 */
export function blendEdgesMirrored(
  pixels: Uint8Array,
  widthPx: number,
  heightPx: number,
  channels: number,
  bandFraction: number,
): void {
  if (bandFraction <= 0) return;
  const bandX = Math.min(Math.floor(widthPx / 2), Math.round(widthPx * bandFraction));
  const bandY = Math.min(Math.floor(heightPx / 2), Math.round(heightPx * bandFraction));
  const rowStride = widthPx * channels;
  if (bandX > 0) {
    for (let d = 0; d < bandX; d++) {
      const w = ownWeight(d, bandX);
      const left = d * channels;
      const right = (widthPx - 1 - d) * channels;
      for (let y = 0; y < heightPx; y++) {
        const row = y * rowStride;
        for (let c = 0; c < channels; c++) mixPair(pixels, row + left + c, row + right + c, w);
      }
    }
  }
  if (bandY > 0) {
    for (let d = 0; d < bandY; d++) {
      const w = ownWeight(d, bandY);
      const top = d * rowStride;
      const bottom = (heightPx - 1 - d) * rowStride;
      for (let i = 0; i < rowStride; i++) mixPair(pixels, top + i, bottom + i, w);
    }
  }
}

function mixPair(p: Uint8Array, a: number, b: number, w: number): void {
  const va = p[a];
  const vb = p[b];
  p[a] = Math.round(w * va + (1 - w) * vb);
  p[b] = Math.round(w * vb + (1 - w) * va);
}
