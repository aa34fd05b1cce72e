/**
 * The one place numbers become text, for the app and the CLI alike. Refuses non-finite numbers
 * (shows a dash), formats per locale with Intl.NumberFormat and always attaches the unit.
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

/** Decimals a result in `unit` is shown with (a verdict on shown figures rounds to them). */
export const resultDigits = (unit: string): number => RESULT_DIGITS[unit] ?? 2;

/** Decimals offered when a typed value is shown in another unit. */
const INPUT_DIGITS: Record<string, number> = { C: 1, F: 1, mm: 3, in: 4, h: 3, min: 1 };

export interface NumberOptions {
  digits?: number;
  grouping?: boolean;
  /** Drop trailing zeros ("10 mm", not "10.000 mm"): for figures inside sentences. */
  trim?: boolean;
}

/** From here on a number is written as a power of ten: a typed 1e308 must not become 309 digits. */
const LARGEST_PLAIN = 1e7;

const cache = new Map<string, Intl.NumberFormat>();

function numberFormat(locale: string, digits: number, grouping: boolean, trim: boolean): Intl.NumberFormat {
  const key = `${locale}|${digits}|${grouping}|${trim}`;
  let nf = cache.get(key);
  if (!nf) {
    // 'min2': no separator in four-digit figures (1150 °C, not "1.150 °C" in German, which reads as a
    // decimal); newer than the ES2022 typings, supported by Node 20 and every current browser.
    const options = {
      maximumFractionDigits: digits,
      minimumFractionDigits: trim ? 0 : digits,
      useGrouping: grouping ? 'min2' : false,
    } as unknown as Intl.NumberFormatOptions;
    nf = new Intl.NumberFormat(locale, options);
    cache.set(key, nf);
  }
  return nf;
}

/** Separators of the app's languages (CLDR); grouping as `useGrouping: 'min2'` does it. */
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
    : `${digits.slice(0, i)}${String(Number(digits[i]) + 1)}${'0'.repeat(digits.length - 1 - i)}`;
}

/**
 * What Intl.NumberFormat writes for `value` in en, es or de, without it: Intl takes a good share
 * of a keystroke's time on a slow phone, and a screen formats a hundred figures. Like Intl, it
 * rounds the shortest decimal form of the number (1.005 → 1.01) half away from zero, groups
 * thousands only from five whole digits on ('min2') and, with `trim`, drops trailing zeros. A
 * property test holds it to Intl's output.
 */
export function formatFixed(
  value: number,
  separators: { group: string; decimal: string },
  digits: number,
  grouping: boolean,
  trim = false,
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
  const wholeDigits = kept.slice(0, kept.length - digits).replace(/^0+(?=\d)/u, '') || '0';
  const grouped =
    grouping && wholeDigits.length >= 5 ? wholeDigits.replace(/\B(?=(\d{3})+$)/gu, separators.group) : wholeDigits;
  let decimals = kept.slice(kept.length - digits);
  if (trim) decimals = decimals.replace(/0+$/u, '');
  const sign = value < 0 || Object.is(value, -0) ? '-' : '';
  return decimals ? `${sign}${grouped}${separators.decimal}${decimals}` : `${sign}${grouped}`;
}

/** A finite number in the locale's notation; NO_VALUE otherwise. */
export function formatNumber(
  value: number,
  locale: string,
  { digits = 2, grouping = true, trim = false }: NumberOptions = {},
): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_VALUE;
  if (Math.abs(value) >= LARGEST_PLAIN) return powerOfTen(value, locale, 3);
  const separators = SEPARATORS[locale];
  const text = separators
    ? formatFixed(value, separators, digits, grouping, trim)
    : numberFormat(locale, digits, grouping, trim).format(value);
  return text.replace(/^-(?=0(?:\D0*)?$)/, '').replace(/^-/, '\u2212'); // no "−0", true minus sign
}

/**
 * A result in `unit` as its shown figure reads, as a number: 0.815 mm is shown "0.82 mm", so 0.82.
 * Verdicts on shown figures (a lab depth inside or outside a range) compare these, so a verdict never
 * contradicts the figures beside it; the same rounding as formatQuantity, whatever the decimal mark.
 */
export function valueAsShown(value: number, unit: string): number {
  if (!Number.isFinite(value)) return Number.NaN;
  const digits = resultDigits(unit);
  return Math.abs(value) >= LARGEST_PLAIN
    ? Number(value.toExponential(2))
    : Number(formatFixed(value, { group: '', decimal: '.' }, digits, false));
}

/** A number with its unit symbol, e.g. "0.87 mm"; NO_VALUE (without unit) when not finite. */
export function formatQuantity(
  value: number,
  unit: string,
  locale: string,
  digits = RESULT_DIGITS[unit] ?? 2,
  trim = false,
): string {
  const number = formatNumber(value, locale, { digits, trim });
  return number === NO_VALUE ? NO_VALUE : `${number}${UNIT_GAP}${unitSymbol(unit)}`;
}

/** The symbol of a unit code ("C" → "°C"); other text as it is. */
export const unitSymbol = (unit: string): string => UNIT_SYMBOLS[unit] ?? unit;

/** Decimals a figure inside a sentence keeps at most (trailing zeros dropped): one more than a result shows. */
const MESSAGE_DIGITS: Record<string, number> = { C: 1, F: 1, mm: 3, in: 3, h: 2, min: 1, s: 1, pctC: 3, pct: 2 };

/** A figure inside a sentence ("between 0 and 10 mm", "0.875 %C"): the unit's precision, no trailing zeros. */
export function formatMessageQuantity(value: number, unit: string, locale: string): string {
  const digits = withinSixDigits(value, MESSAGE_DIGITS[unit] ?? RESULT_DIGITS[unit] ?? 3);
  return formatQuantity(value, unit, locale, digits, true);
}

/** A plain figure inside a sentence (a count, a factor): at most 3 decimals, at most 6 significant digits. */
export function formatMessageNumber(value: number, locale: string): string {
  return formatNumber(value, locale, { digits: withinSixDigits(value, 3), trim: true });
}

/** Decimals, at most `digits`, that keep a figure within 6 significant digits (100000.05 °C → "100000 °C"). */
function withinSixDigits(value: number, digits: number): number {
  const integerDigits = Math.floor(Math.log10(Math.max(Math.abs(value), 1))) + 1;
  return Math.max(0, Math.min(digits, 6 - integerDigits));
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
  return a === NO_VALUE || b === NO_VALUE ? NO_VALUE : `${a}–${b}${UNIT_GAP}${unitSymbol(unit)}`;
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

/** "1,23 × 10⁻¹¹": a finite, non-zero number as a mantissa and a power of ten. */
function powerOfTen(value: number, locale: string, significant: number): string {
  // toExponential rounds the mantissa and carries into the exponent (9.996e2 → "1.00e+3"), even for denormals.
  const [mantissa = '', exponent = ''] = value.toExponential(significant - 1).split('e');
  const m = numberFormat(locale, significant - 1, false, false)
    .format(Number(mantissa))
    .replace(/^-/, '\u2212');
  const e = String(Number(exponent)).replace(/./g, (ch) => SUPERSCRIPT[ch] ?? ch);
  return `${m}${UNIT_GAP}×${UNIT_GAP}10${e}`;
}

/** Scientific notation "1,23 × 10⁻¹¹ m²/s" for very small quantities such as D. */
export function formatScientific(value: number, unit: string, locale: string, significant = 3): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return NO_VALUE;
  if (value === 0) return formatQuantity(0, unit, locale, 0);
  return `${powerOfTen(value, locale, significant)}${UNIT_GAP}${unitSymbol(unit)}`;
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

/** A plain typed number ("0.75", "1,5"), nothing else: the only text whose decimal mark may be shown localized. */
const PLAIN_DECIMAL = /^\s*[+-]?\d+[.,]\d+\s*$/u;

/**
 * Text as typed with the locale's decimal mark, when it is a plain decimal number ("0.75" → "0,75" in
 * German); anything else (a time "1:20", a half-typed "0.") as it is. The value read is the same.
 */
export function localizeTyped(text: string, locale: string): string {
  if (!PLAIN_DECIMAL.test(text)) return text;
  const mark = decimalMark(locale);
  return text.replace(/[.,]/u, mark);
}

const marks = new Map<string, string>();

/** The locale's decimal mark, "." or ",". */
export function decimalMark(locale: string): string {
  let mark = marks.get(locale);
  if (mark === undefined) {
    // The app's own languages without Intl: the first Intl object of a page is a long task (ICU's data).
    mark =
      SEPARATORS[locale]?.decimal ??
      new Intl.NumberFormat(locale).formatToParts(1.5).find((part) => part.type === 'decimal')?.value ??
      '.';
    marks.set(locale, mark);
  }
  return mark;
}

/** Text for an input field holding a value converted from another unit (no grouping, so it parses back). */
export function formatInput(value: number, unit: string, locale: string): string {
  if (!Number.isFinite(value)) return '';
  if (Math.abs(value) >= LARGEST_PLAIN) return String(Number(value.toPrecision(6))); // "1e+308" parses back
  const digits = INPUT_DIGITS[unit] ?? 4;
  const text = formatNumber(value, locale, { digits, grouping: false });
  // Trailing zeros add nothing to a typed value.
  return text.includes('.') || text.includes(',') ? text.replace(/[.,]?0+$/, '') : text;
}
