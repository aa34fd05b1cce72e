/**
 * The one place numbers become text. Refuses non-finite numbers (shows a dash),
 * formats per locale (Intl.NumberFormat, or the same digits written here for the app's own
 * languages) and always attaches the unit.
 */

/** Shown instead of a number that is not finite: never NaN or Infinity on screen. */
export const NO_VALUE = '–';

/** Narrow no-break space between a number and its unit. */
const UNIT_GAP = '\u202f';

/** Unit symbols (SI or trade symbols, the same in every language). */
export const UNIT_SYMBOLS: Record<string, string> = {
  C: '°C',
  F: '°F',
  K: 'K',
  R: '°R',
  mm: 'mm',
  um: 'µm',
  in: 'in',
  thou: 'thou',
  m: 'm',
  h: 'h',
  min: 'min',
  s: 's',
  'm2/s': 'm²/s',
  'cm2/s': 'cm²/s',
  'mm2/h': 'mm²/h',
  'in2/h': 'in²/h',
  HRC: 'HRC',
  HV: 'HV',
  pct: '%',
  pctC: '%C',
  beta7: '×10⁻⁷ m/s',
};

/** Decimals shown for a result in each unit. */
const RESULT_DIGITS: Record<string, number> = {
  C: 0,
  F: 0,
  K: 0,
  R: 0,
  mm: 2,
  um: 0,
  in: 3,
  thou: 1,
  m: 5,
  h: 2,
  min: 0,
  s: 0,
  HRC: 0,
  HV: 0,
  pct: 2,
  pctC: 2,
};

/** Decimals offered when a typed value is shown in another unit. */
const INPUT_DIGITS: Record<string, number> = { C: 1, F: 1, mm: 3, in: 4, h: 3, min: 1 };

export interface NumberOptions {
  digits?: number;
  grouping?: boolean;
}

const cache = new Map<string, Intl.NumberFormat>();

function numberFormat(locale: string, digits: number, grouping: boolean): Intl.NumberFormat {
  const key = `${locale}|${digits}|${grouping}`;
  let nf = cache.get(key);
  if (!nf) {
    nf = new Intl.NumberFormat(locale, {
      maximumFractionDigits: digits,
      minimumFractionDigits: digits,
      useGrouping: grouping,
    });
    cache.set(key, nf);
  }
  return nf;
}

/** Separators of the app's languages (CLDR), with grouping always on as `useGrouping: true` asks. */
const SEPARATORS: Readonly<Record<string, { group: string; decimal: string }>> = {
  en: { group: ',', decimal: '.' },
  es: { group: '.', decimal: ',' },
  de: { group: '.', decimal: ',' },
};

/** "999" + 1 in decimal digits: "1000". */
function incremented(digits: string): string {
  let i = digits.length - 1;
  while (i >= 0 && digits[i] === '9') i--;
  return i < 0
    ? `1${'0'.repeat(digits.length)}`
    : `${digits.slice(0, i)}${Number(digits[i]) + 1}${'0'.repeat(digits.length - 1 - i)}`;
}

/**
 * What Intl.NumberFormat writes for `value` in en, es or de, without it: Intl takes a good share
 * of a keystroke's time on a slow phone, and a screen formats a hundred figures. Like Intl, it
 * rounds the shortest decimal form of the number (1.005 → 1.01) half away from zero. A property
 * test holds it to Intl's output.
 */
export function formatFixed(
  value: number,
  separators: { group: string; decimal: string },
  digits: number,
  grouping: boolean,
): string {
  const [mantissa = '0', exponent = '0'] = Math.abs(value).toString().split('e');
  const [whole = '0', fraction = ''] = mantissa.split('.');
  let all = whole + fraction;
  let point = whole.length + Number(exponent);
  if (point < 0) {
    all = '0'.repeat(-point) + all;
    point = 0;
  }
  const keep = point + digits;
  let kept = all.slice(0, keep).padEnd(keep, '0');
  if (all.length > keep && all.charCodeAt(keep) >= 53) kept = incremented(kept);
  const wholeDigits = kept.slice(0, kept.length - digits).replace(/^0+(?=\d)/, '') || '0';
  const grouped = grouping ? wholeDigits.replace(/\B(?=(\d{3})+$)/g, separators.group) : wholeDigits;
  const sign = value < 0 || Object.is(value, -0) ? '-' : '';
  return digits > 0 ? `${sign}${grouped}${separators.decimal}${kept.slice(kept.length - digits)}` : `${sign}${grouped}`;
}

/** A finite number in the locale's notation; NO_VALUE otherwise. */
export function formatNumber(
  value: number,
  locale: string,
  { digits = 2, grouping = true }: NumberOptions = {},
): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_VALUE;
  const separators = SEPARATORS[locale];
  const text = separators
    ? formatFixed(value, separators, digits, grouping)
    : numberFormat(locale, digits, grouping).format(value);
  return text.replace(/^-(?=0(?:\D0*)?$)/, '').replace(/^-/, '\u2212'); // no "−0", true minus sign
}

/** A number with its unit symbol, e.g. "0.87 mm"; NO_VALUE (without unit) when not finite. */
export function formatQuantity(value: number, unit: string, locale: string, digits = RESULT_DIGITS[unit] ?? 2): string {
  const number = formatNumber(value, locale, { digits });
  return number === NO_VALUE ? NO_VALUE : `${number}${UNIT_GAP}${UNIT_SYMBOLS[unit] ?? unit}`;
}

/** A range "a–b unit"; NO_VALUE when either end is not finite. */
export function formatRange(
  min: number,
  max: number,
  unit: string,
  locale: string,
  digits = RESULT_DIGITS[unit] ?? 2,
): string {
  const a = formatNumber(min, locale, { digits });
  const b = formatNumber(max, locale, { digits });
  return a === NO_VALUE || b === NO_VALUE ? NO_VALUE : `${a}–${b}${UNIT_GAP}${UNIT_SYMBOLS[unit] ?? unit}`;
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** Scientific notation "1,23 × 10⁻¹¹ m²/s" for very small quantities such as D. */
export function formatScientific(value: number, unit: string, locale: string, significant = 3): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_VALUE;
  if (value === 0) return formatQuantity(0, unit, locale, 0);
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const mantissa = value / 10 ** exponent;
  const m = formatNumber(mantissa, locale, { digits: significant - 1 });
  const e = String(exponent).replace(/./g, (ch) => SUPERSCRIPT[ch] ?? ch);
  return `${m}${UNIT_GAP}×${UNIT_GAP}10${e}${UNIT_GAP}${UNIT_SYMBOLS[unit] ?? unit}`;
}

/** Whole hours and minutes, e.g. "5 h 50 min", for times an operator sets on a controller. */
export function formatHoursMinutes(timeH: number, locale: string): string {
  if (!Number.isFinite(timeH) || timeH < 0) return NO_VALUE;
  const totalMin = Math.round(timeH * 60);
  const h = Math.floor(totalMin / 60);
  const min = totalMin - h * 60;
  const hours = `${formatNumber(h, locale, { digits: 0 })}${UNIT_GAP}h`;
  return min === 0 ? hours : `${hours} ${formatNumber(min, locale, { digits: 0 })}${UNIT_GAP}min`;
}

/** Text for an input field holding a value converted from another unit (no grouping, so it parses back). */
export function formatInput(value: number, unit: string, locale: string): string {
  if (!Number.isFinite(value)) return '';
  const digits = INPUT_DIGITS[unit] ?? 4;
  const text = formatNumber(value, locale, { digits, grouping: false });
  // Trailing zeros add nothing to a typed value.
  return text.includes('.') || text.includes(',') ? text.replace(/[.,]?0+$/, '') : text;
}
