// Prices in a studio's own currency and locale: one formatter for every screen, the CSV and the
// client's page (ISO 4217 currency codes, BCP 47 locales, through Intl.NumberFormat).

export interface MoneySettings {
  /** ISO 4217, e.g. "GBP". */
  currency: string;
  /** BCP 47, e.g. "en-GB". */
  locale: string;
}

/** The demo studio's: what a studio starts with until its owner chooses. */
export const DEFAULT_MONEY: MoneySettings = { currency: 'GBP', locale: 'en-GB' };

const cache = new Map<string, Intl.NumberFormat>();

/** "£1,280.00", "1.280,00 €": the price with its currency, as the studio's locale writes it. */
export function formatMoney(value: number, money: MoneySettings = DEFAULT_MONEY): string {
  const key = `${money.locale}|${money.currency}`;
  let format = cache.get(key);
  if (!format) {
    format = new Intl.NumberFormat(money.locale, { style: 'currency', currency: money.currency });
    cache.set(key, format);
  }
  return format.format(value);
}

/** Whether Intl knows this currency code (upper case, three letters). */
export function isCurrency(code: string): boolean {
  return /^[A-Z]{3}$/.test(code) && Intl.supportedValuesOf('currency').includes(code);
}

/** The locale written canonically ("en-gb" → "en-GB"), or null when it is not a BCP 47 tag. */
export function canonicalLocale(tag: string): string | null {
  try {
    const [canonical] = Intl.getCanonicalLocales(tag);
    return canonical ?? null;
  } catch {
    return null;
  }
}
