// Tests for money: prices formatted in the studio's currency and locale (checked against the CLDR
// conventions for en-GB and de-DE), and which currencies and locales are known.
import { describe, expect, it } from 'vitest';
import { canonicalLocale, formatMoney, isCurrency } from './money';

describe('money', () => {
  it('formats in the studio’s currency and locale (CLDR: en-GB puts £ first, de-DE puts € last with a comma)', () => {
    expect(formatMoney(1280, { currency: 'GBP', locale: 'en-GB' })).toBe('£1,280.00');
    expect(formatMoney(1280, { currency: 'EUR', locale: 'de-DE' }).replace(/\s/g, ' ')).toBe('1.280,00 €');
    // Yen has no minor unit (ISO 4217: 0 decimals).
    expect(formatMoney(1280, { currency: 'JPY', locale: 'ja-JP' })).toBe('￥1,280');
  });
  it('knows currencies and locales', () => {
    expect(isCurrency('EUR')).toBe(true);
    expect(isCurrency('EURO')).toBe(false);
    expect(isCurrency('eur')).toBe(false);
    expect(canonicalLocale('en-gb')).toBe('en-GB');
    expect(canonicalLocale('not a locale')).toBeNull();
  });
});
