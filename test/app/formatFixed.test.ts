/**
 * The formatter of the app's own languages writes what Intl.NumberFormat writes (Node's ICU, the
 * same library the browsers use) for every finite number, every count of decimals and both
 * groupings; other locales still go through Intl.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../src/i18n/format';

const intl = (value: number, locale: string, digits: number, grouping: boolean, trim = false) =>
  new Intl.NumberFormat(locale, {
    maximumFractionDigits: digits,
    minimumFractionDigits: trim ? 0 : digits,
    useGrouping: grouping ? 'min2' : false,
  } as unknown as Intl.NumberFormatOptions)
    .format(value)
    .replace(/^-(?=0(?:\D0*)?$)/, '')
    .replace(/^-/, '\u2212');

const locales = fc.constantFrom('en', 'es', 'de');
const digits = fc.integer({ min: 0, max: 8 });
/** Figures as the screens have them, and the awkward ones: ties, tiny magnitudes, −0 (from 1e7 on a power of ten is written). */
const values = fc.oneof(
  fc.double({ min: -1e7, max: 1e7, noNaN: true, maxExcluded: true, minExcluded: true }),
  fc.integer({ min: -1e6, max: 1e6 }).chain((n) => fc.integer({ min: 0, max: 6 }).map((k) => (n + 0.5) / 10 ** k)),
  fc.constantFrom(0, -0, 1.005, 2.5, -0.5, 0.045, 999.995, 9999.5, 1.5e-7, 1234567.125, -0.004),
);

describe('number formatting without Intl for en, es and de', () => {
  it('matches Intl.NumberFormat digit for digit', () => {
    fc.assert(
      fc.property(values, locales, digits, fc.boolean(), fc.boolean(), (value, locale, d, grouping, trim) => {
        expect(formatNumber(value, locale, { digits: d, grouping, trim })).toBe(intl(value, locale, d, grouping, trim));
      }),
      { numRuns: 20000 },
    );
  });

  it('writes the separators of each language (checked by hand against CLDR)', () => {
    expect(formatNumber(1234567.891, 'en')).toBe('1,234,567.89');
    expect(formatNumber(1234567.891, 'es')).toBe('1.234.567,89');
    expect(formatNumber(1234567.891, 'de')).toBe('1.234.567,89');
    expect(formatNumber(-1234.5, 'de', { digits: 1, grouping: false })).toBe('\u22121234,5');
    expect(formatNumber(-0.004, 'en')).toBe('0.00');
    // Four whole digits stay together: "1.150" would read as a decimal in German.
    expect(formatNumber(1150, 'de', { digits: 0 })).toBe('1150');
    expect(formatNumber(12500, 'de', { digits: 0 })).toBe('12.500');
  });

  it('leaves other locales to Intl', () => {
    expect(formatNumber(1234.5, 'fr', { digits: 1 })).toBe(intl(1234.5, 'fr', 1, true));
  });
});
