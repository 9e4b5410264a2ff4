// Words and short formats for finishes: category, sheen, edge blend and price unit labels, the
// repeat size, the price line and the library summary line.
import { formatMoney, type MoneySettings } from '../../../../shared/units/money';
import type { EdgeBlend, Finish, FinishCategory, PriceUnit, Sheen } from '../../../../shared/schemas/finish';
import { formatLength } from '../../../../shared/units/length';

export const CATEGORY_LABELS: Record<FinishCategory, string> = {
  floor: 'Floor',
  wall: 'Wall',
  tile: 'Tile',
  wood: 'Wood',
  stone: 'Stone',
  fabric: 'Fabric',
  wallpaper: 'Wallpaper',
  other: 'Other',
};

export const SHEEN_LABELS: Record<Sheen, string> = { matt: 'Matt', eggshell: 'Eggshell', satin: 'Satin', gloss: 'Gloss' };

export const EDGE_BLEND_LABELS: Record<EdgeBlend, string> = {
  none: 'None (the crop already repeats)',
  narrow: 'Narrow',
  wide: 'Wide',
};

/** Short, so a price fits beside a supplier on a library card. */
export const PRICE_UNIT_LABELS: Record<PriceUnit, string> = { m2: '/ m²', unit: '/ unit', litre: '/ L' };
/** The "Per" choices, in words that fit the field. */
export const PRICE_UNIT_CHOICES: Record<PriceUnit, string> = { litre: 'litre', m2: 'm²', unit: 'unit' };

/** "60 × 120 cm": the real size a photo finish's crop covers. */
export function formatRepeat(widthMm: number, heightMm: number): string {
  return `${formatLength(widthMm, 'cm').replace(/ cm$/, '')} × ${formatLength(heightMm, 'cm')}`;
}

/** "£14.50 / L": the price in the studio's currency and locale, with what it is per. */
export function formatPrice(f: Pick<Finish, 'price' | 'priceUnit'>, money: MoneySettings): string | null {
  if (f.price === null) return null;
  return `${formatMoney(f.price, money)}${f.priceUnit ? ` ${PRICE_UNIT_LABELS[f.priceUnit]}` : ''}`;
}

/** The short line under a finish's name in the library. */
export function finishSummary(f: Finish): string {
  if (f.kind === 'paint') return `Paint · ${SHEEN_LABELS[f.sheen]} · ${f.colourHex}`;
  return `${CATEGORY_LABELS[f.category]} · ${formatRepeat(f.repeatWidthMm, f.repeatHeightMm)}`;
}
