// Paint tins to buy for a need in litres: the fewest tins that cover it while leaving less over
// than the smallest tin (a spare that big would be a tin bought for nothing), then the least left
// over. Fewer, larger tins is how paint is usually bought; it is also usually cheaper per litre.
import { itemAt } from '../item-at';

/** Tin sizes paint is commonly sold in, litres (common practice; the maker's range wins). */
export const COMMON_TIN_SIZES_L: readonly number[] = [0.75, 1, 2.5, 5, 10];

/** The largest need the tin search takes, litres: far beyond any room, small enough to search exactly. */
export const MAX_TIN_NEED_L = 100_000;

/** Tin sizes are matched to the millilitre: no tin is sold finer than that. */
const ML_PER_L = 1000;

export interface TinCount {
  sizeL: number;
  count: number;
}

/** What to buy: tins largest first, the litres they hold, and what is left over after the need. */
export interface TinPlan {
  tins: TinCount[];
  totalL: number;
  spareL: number;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * The tins (sizes in litres) covering `needL` litres: among the totals that leave less over than
 * the smallest tin, the one needing the fewest tins; ties go to less left over, then larger tins.
 * Exact: sizes are counted in steps of their common divisor (in mL) and every total is tried.
 */
export function chooseTins(needL: number, sizesL: readonly number[] = COMMON_TIN_SIZES_L): TinPlan {
  if (!Number.isFinite(needL) || needL < 0) throw new RangeError(`A paint need must be 0 litres or more (got ${needL}).`);
  if (needL > MAX_TIN_NEED_L) throw new RangeError(`A paint need above ${MAX_TIN_NEED_L} litres is not a room's worth.`);
  const sizesMl = [...new Set(sizesL.map((s) => Math.round(s * ML_PER_L)))].sort((a, b) => b - a);
  if (sizesMl.length === 0 || sizesMl.some((s) => !(s > 0))) throw new RangeError('Tin sizes must be at least 1 mL each.');
  if (needL === 0) return { tins: [], totalL: 0, spareL: 0 };

  const step = sizesMl.reduce(gcd);
  const sizes = sizesMl.map((s) => s / step);
  // The tiny allowance keeps 7.0000000001 L (floating point) from asking for a further tin.
  const need = Math.ceil((needL * ML_PER_L - 1e-6) / step);
  const limit = need + itemAt(sizes, 0, 'tin size');

  // fewest[t]: the fewest tins holding exactly t steps; pick[t]: the size index of one of them.
  const fewest = new Int32Array(limit + 1).fill(-1);
  const pick = new Int32Array(limit + 1).fill(-1);
  fewest[0] = 0;
  for (let t = 1; t <= limit; t++) {
    // Sizes run largest first and only a strictly better count replaces, so ties keep larger tins.
    for (let k = 0; k < sizes.length; k++) {
      const rest = t - sizes[k]!;
      if (rest < 0 || fewest[rest]! < 0) continue;
      if (fewest[t]! < 0 || fewest[rest]! + 1 < fewest[t]!) {
        fewest[t] = fewest[rest]! + 1;
        pick[t] = k;
      }
    }
  }
  // Totals leaving less over than the smallest tin; if none is reachable, the first one above.
  const smallest = itemAt(sizes, sizes.length - 1, 'tin size');
  let total = -1;
  for (let t = need; t < need + smallest && t <= limit; t++) {
    if (fewest[t]! >= 0 && (total < 0 || fewest[t]! < fewest[total]!)) total = t;
  }
  if (total < 0) {
    total = need;
    while (fewest[total]! < 0) total++;
  }

  const counts = new Array<number>(sizes.length).fill(0);
  for (let t = total; t > 0;) {
    const k = pick[t]!;
    counts[k] = counts[k]! + 1;
    t -= sizes[k]!;
  }
  const tins = sizesMl.map((ml, k) => ({ sizeL: ml / ML_PER_L, count: counts[k]! })).filter((c) => c.count > 0);
  const totalMl = total * step;
  return { tins, totalL: totalMl / ML_PER_L, spareL: Math.round(totalMl - needL * ML_PER_L) / ML_PER_L };
}

/** "5 L + 2.5 L", "2 × 10 L + 1 L": the tins in words, largest first. */
export function describeTins(plan: TinPlan): string {
  if (plan.tins.length === 0) return 'none';
  return plan.tins.map((t) => `${t.count > 1 ? `${t.count} × ` : ''}${formatLitres(t.sizeL)} L`).join(' + ');
}

function formatLitres(litres: number): string {
  return String(Math.round(litres * ML_PER_L) / ML_PER_L);
}
