/**
 * Physics values (°C, mm, h, %C, m²/s) shown in the user's units and locale.
 * Every figure on a screen goes through here, so every figure has its unit.
 */
import { convert, convertTemperatureDifference, hrcToHv, type Hardness } from '../../physics';
import {
  formatHoursMinutes,
  formatNumber,
  formatQuantity,
  formatRange,
  formatScientific,
  NO_VALUE,
  valueAsShown,
} from './format';
import { messageFigures, type Figures } from '../../i18n/wording';
import type { DisplayUnits } from './units';

export interface Show {
  depth(mm: number): string;
  depthRange(minMm: number, maxMm: number): string;
  /** A signed depth change, e.g. "+0.05 mm". */
  depthChange(mm: number): string;
  /** A depth as `depth` shows it: in the user's unit, rounded to the decimals shown (for verdicts on shown figures). */
  depthAsShown: (mm: number) => number;
  temperature(tempC: number): string;
  temperatureRange(minC: number, maxC: number): string;
  temperatureDifference(deltaC: number): string;
  time(h: number): string;
  timeRange(minH: number, maxH: number): string;
  hoursMinutes(h: number): string;
  carbon(pct: number): string;
  carbonRange(minPct: number, maxPct: number): string;
  diffusivity(m2PerS: number): string;
  hardnessHrc(hrc: number): string;
  /** Approximate HV for an HRC value, or NO_VALUE outside the table. */
  hardnessHv(hrc: number): string;
  /** A hardness in its own scale (whole numbers unless `digits` says otherwise). */
  hardness(h: Hardness, digits?: number): string;
  number(value: number, digits: number): string;
  /** Figures inside sentences (errors, cautions): the unit's precision without trailing zeros. */
  figures: Figures;
}

function to(value: number, from: string, unit: string): number {
  const converted = convert(value, from, unit);
  return converted.ok ? converted.value : Number.NaN; // NaN is refused by the formatter: shown as a dash
}

export function makeShow(units: DisplayUnits, locale: string): Show {
  const depth = (mm: number) => to(mm, 'mm', units.depth);
  const temp = (c: number) => to(c, 'C', units.temperature);
  const time = (h: number) => to(h, 'h', units.time);
  return {
    depth: (mm) => formatQuantity(depth(mm), units.depth, locale),
    depthRange: (a, b) => formatRange(depth(a), depth(b), units.depth, locale),
    depthAsShown: (mm) => valueAsShown(depth(mm), units.depth),
    depthChange: (mm) => {
      const text = formatQuantity(depth(mm), units.depth, locale);
      return text === NO_VALUE || mm < 0 || text.startsWith('\u2212') ? text : `+${text}`;
    },
    temperature: (c) => formatQuantity(temp(c), units.temperature, locale),
    temperatureRange: (a, b) => formatRange(temp(a), temp(b), units.temperature, locale),
    temperatureDifference: (d) =>
      formatQuantity(convertTemperatureDifference(d, 'C', units.temperature), units.temperature, locale),
    time: (h) => formatQuantity(time(h), units.time, locale),
    timeRange: (a, b) => formatRange(time(a), time(b), units.time, locale),
    hoursMinutes: (h) => formatHoursMinutes(h, locale),
    carbon: (pct) => formatQuantity(pct, 'pctC', locale),
    carbonRange: (a, b) => formatRange(a, b, 'pctC', locale),
    diffusivity: (d) => formatScientific(d, 'm2/s', locale),
    hardnessHrc: (hrc) => formatQuantity(hrc, 'HRC', locale),
    hardnessHv: (hrc) => formatQuantity(hrcToHv(hrc) ?? Number.NaN, 'HV', locale),
    hardness: (h, digits) => formatQuantity(h.value, h.unit, locale, digits),
    number: (value, digits) => formatNumber(value, locale, { digits }),
    figures: messageFigures(units, locale),
  };
}
