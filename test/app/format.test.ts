import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseNumber } from '../../src/physics';
import {
  formatHoursMinutes,
  formatInput,
  formatNumber,
  formatQuantity,
  formatRange,
  formatScientific,
  NO_VALUE,
} from '../../src/app/ui/format';

describe('formatting refuses non-finite numbers', () => {
  it.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])(
    '%s is shown as a dash, never as NaN or Infinity',
    (value) => {
      for (const text of [
        formatNumber(value, 'en'),
        formatQuantity(value, 'mm', 'de'),
        formatRange(value, 1, 'mm', 'es'),
        formatScientific(value, 'm2/s', 'en'),
        formatHoursMinutes(value, 'en'),
      ]) {
        expect(text).toBe(NO_VALUE);
      }
    },
  );

  it('no formatted output ever contains NaN or Infinity (property)', () => {
    fc.assert(
      fc.property(
        fc.double(),
        fc.constantFrom('en', 'es', 'de'),
        fc.constantFrom('mm', 'C', 'h', 'HRC', 'in'),
        (value, locale, unit) => {
          const out = [
            formatQuantity(value, unit, locale),
            formatScientific(value, 'm2/s', locale),
            formatHoursMinutes(value, locale),
            formatInput(value, unit, locale),
          ];
          return out.every((s) => !/NaN|Infinity|∞/.test(s));
        },
      ),
    );
  });
});

describe('numbers per locale, always with their unit', () => {
  it('uses the locale decimal mark and attaches the unit', () => {
    expect(formatQuantity(0.8412, 'mm', 'en')).toBe('0.84\u202fmm');
    expect(formatQuantity(0.8412, 'mm', 'de')).toBe('0,84\u202fmm');
    expect(formatQuantity(925, 'C', 'es')).toBe('925\u202f°C');
  });
  it('a negative zero is shown without a sign; negatives use a true minus', () => {
    expect(formatNumber(-0.0001, 'en', { digits: 2 })).toBe('0.00');
    expect(formatNumber(-0.05, 'en', { digits: 2 })).toBe('\u22120.05');
  });
  it('scientific notation with superscript exponent', () => {
    expect(formatScientific(1.234e-11, 'm2/s', 'en')).toBe('1.23\u202f×\u202f10⁻¹¹\u202fm²/s');
    expect(formatScientific(1.234e-11, 'm2/s', 'de')).toBe('1,23\u202f×\u202f10⁻¹¹\u202fm²/s');
  });
  it('hours and minutes for controller settings', () => {
    expect(formatHoursMinutes(5.8333, 'en')).toBe('5\u202fh 50\u202fmin');
    expect(formatHoursMinutes(4, 'en')).toBe('4\u202fh');
  });
  it('input text converted from another unit parses back to the same value (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5000, max: 5000, noNaN: true }),
        fc.constantFrom('en', 'es', 'de'),
        (value, locale) => {
          const text = formatInput(value, 'in', locale);
          const parsed = parseNumber(text);
          return parsed.ok && Math.abs(parsed.value - value) <= 0.00005 + 1e-9;
        },
      ),
    );
  });
});
