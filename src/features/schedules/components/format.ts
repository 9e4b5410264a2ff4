// Number, quantity and money formatting shared by the take-off and schedule pages.
import { QUANTITY_UNIT_LABELS, type QuantityUnit } from '../../../../shared/analysis/schedule-lines';

const quantityFormat = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 });

/** Prices are written in the studio's currency and locale (its settings, through the session). */
export { useFormatMoney } from '../../../lib/session';
export const formatNumber = (value: number) => quantityFormat.format(value);

export function formatQuantity(value: number, unit: QuantityUnit): string {
  return unit === 'piece' ? formatNumber(value) : `${formatNumber(value)} ${QUANTITY_UNIT_LABELS[unit]}`;
}
