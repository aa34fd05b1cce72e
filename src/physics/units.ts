/**
 * Unit conversions and the shop-floor number parser.
 *
 * Factors from NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly,
 * °F = 1.8·°C + 32, K = °C + 273.15, °R = 1.8·K. 1 thou (mil) = 0.001 in.
 * Physics works in SI inside (m, s, K, m²/s); these convert at the edges.
 */
import { fail, ok, type Result } from './result';

/** NIST SP 811: the inch is exactly 25.4 mm. */
export const MM_PER_INCH = 25.4;
/** NIST SP 811: 0 °C = 273.15 K exactly. */
export const KELVIN_OFFSET = 273.15;
export const SECONDS_PER_HOUR = 3600;

export const UNITS = {
  temperature: ['C', 'F', 'K', 'R'],
  length: ['mm', 'um', 'in', 'thou', 'm'],
  time: ['h', 'min', 's'],
  diffusivity: ['m2/s', 'cm2/s', 'mm2/h', 'in2/h'],
} as const;

export type Quantity = keyof typeof UNITS;
export type TemperatureUnit = (typeof UNITS.temperature)[number];
export type LengthUnit = (typeof UNITS.length)[number];
export type TimeUnit = (typeof UNITS.time)[number];
export type DiffusivityUnit = (typeof UNITS.diffusivity)[number];
export type Unit = TemperatureUnit | LengthUnit | TimeUnit | DiffusivityUnit;

/** °C → K. */
export const celsiusToKelvin = (tempC: number): number => tempC + KELVIN_OFFSET;
/** K → °C. */
export const kelvinToCelsius = (tempK: number): number => tempK - KELVIN_OFFSET;

const toKelvin: Record<TemperatureUnit, (v: number) => number> = {
  C: (v) => v + KELVIN_OFFSET,
  F: (v) => (v - 32) / 1.8 + KELVIN_OFFSET,
  K: (v) => v,
  R: (v) => v / 1.8,
};
const fromKelvin: Record<TemperatureUnit, (k: number) => number> = {
  C: (k) => k - KELVIN_OFFSET,
  F: (k) => (k - KELVIN_OFFSET) * 1.8 + 32,
  K: (k) => k,
  R: (k) => k * 1.8,
};

/** Size of one unit in the SI base of its quantity (m, s, m²/s). */
const scaleToSi: Record<Exclude<Unit, TemperatureUnit>, number> = {
  m: 1,
  mm: 1e-3,
  um: 1e-6,
  in: MM_PER_INCH * 1e-3,
  thou: MM_PER_INCH * 1e-6,
  s: 1,
  min: 60,
  h: SECONDS_PER_HOUR,
  'm2/s': 1,
  'cm2/s': 1e-4,
  'mm2/h': 1e-6 / SECONDS_PER_HOUR,
  'in2/h': (MM_PER_INCH * 1e-3) ** 2 / SECONDS_PER_HOUR,
};

/** Temperature between °C, °F, K and °R (NIST SP 811). Absolute temperatures only, not differences. */
export function convertTemperature(value: number, from: TemperatureUnit, to: TemperatureUnit): number {
  return fromKelvin[to](toKelvin[from](value));
}

/** A temperature difference (e.g. a ±10 °C tolerance) between units: no offset, only the scale. */
export function convertTemperatureDifference(value: number, from: TemperatureUnit, to: TemperatureUnit): number {
  const kelvinPer: Record<TemperatureUnit, number> = { C: 1, K: 1, F: 1 / 1.8, R: 1 / 1.8 };
  return (value * kelvinPer[from]) / kelvinPer[to];
}

export function quantityOf(unit: string): Quantity | undefined {
  return (Object.keys(UNITS) as Quantity[]).find((q) => (UNITS[q] as readonly string[]).includes(unit));
}

/**
 * Converts a value between two units of the same quantity.
 * Returns a typed error for an unknown unit or units of different quantities.
 */
export function convert(value: number, from: string, to: string): Result<number> {
  const qFrom = quantityOf(from);
  if (!qFrom) return fail('unit.unknown', 'from', { unit: from });
  const qTo = quantityOf(to);
  if (!qTo || qTo !== qFrom) return fail('unit.unknown', 'to', { unit: to });
  if (!Number.isFinite(value)) return fail('field.notNumber', 'value');
  if (qFrom === 'temperature' && toKelvin[from as TemperatureUnit](value) < 0) {
    return fail('temperature.belowAbsoluteZero', 'value', { value, unit: from });
  }
  if (from === to) return ok(value);
  const out =
    qFrom === 'temperature'
      ? convertTemperature(value, from as TemperatureUnit, to as TemperatureUnit)
      : (value * scaleToSi[from as Exclude<Unit, TemperatureUnit>]) / scaleToSi[to as Exclude<Unit, TemperatureUnit>];
  return Number.isFinite(out) ? ok(out) : fail('field.notNumber', 'value');
}

/** Molar masses (IUPAC standard atomic weights): carbon 12.011, iron 55.845 g/mol. */
export const MOLAR_MASS_C = 12.011;
export const MOLAR_MASS_FE = 55.845;

/** Carbon wt% (binary Fe–C) → mole fraction x_C. */
export function carbonWtPctToMoleFraction(carbonPct: number): number {
  const molC = carbonPct / MOLAR_MASS_C;
  const molFe = (100 - carbonPct) / MOLAR_MASS_FE;
  return molC / (molC + molFe);
}

/** Mole fraction x_C (binary Fe–C) → carbon wt%. */
export function carbonMoleFractionToWtPct(moleFraction: number): number {
  const massC = moleFraction * MOLAR_MASS_C;
  const massFe = (1 - moleFraction) * MOLAR_MASS_FE;
  return (100 * massC) / (massC + massFe);
}

const NUMBER_PATTERN = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/**
 * Parses a number as typed on the shop floor: `0,8` and `0.8` both mean 0.8.
 * Spaces around it are ignored; thousands separators are not accepted (`1,234`
 * is 1.234, the decimal comma). Anything else returns a typed error.
 */
export function parseNumber(text: string): Result<number> {
  const trimmed = text.trim().replace(/\u2212/g, '-');
  if (trimmed === '') return fail('number.empty');
  if (!NUMBER_PATTERN.test(trimmed)) return fail('number.invalid', undefined, { text: trimmed });
  const value = Number(trimmed.replace(',', '.'));
  return Number.isFinite(value) ? ok(value) : fail('number.invalid', undefined, { text: trimmed });
}
