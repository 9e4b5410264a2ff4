import { QUANTITY_UNIT_LABELS, type QuantityUnit } from '../../../../shared/analysis/schedule-lines';

const moneyFormat = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
const quantityFormat = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 });

/** Prices carry no currency: the studio works in its own. */
export const formatMoney = (value: number) => moneyFormat.format(value);
export const formatNumber = (value: number) => quantityFormat.format(value);

export function formatQuantity(value: number, unit: QuantityUnit): string {
  return unit === 'piece' ? formatNumber(value) : `${formatNumber(value)} ${QUANTITY_UNIT_LABELS[unit]}`;
}
