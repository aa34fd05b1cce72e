/**
 * How finely a figure is written where it leaves the program as a number (the CLI's JSON, the CSV):
 * finer than any figure the trade reads, without floating noise (900.0000000000001 → 900). Screens
 * and sentences use the locale-aware formatter instead.
 */

export type OutputPrecision = { decimals: number } | { significant: number };

/** By quantity: depths and carbon to 0.0001 mm and %C, temperatures to 0.01 °C, times to 0.0001 h. */
export const OUTPUT_PRECISION = {
  mm: { decimals: 4 },
  pct: { decimals: 4 },
  C: { decimals: 2 },
  h: { decimals: 4 },
  hrc: { decimals: 1 },
  hv: { decimals: 0 },
  /** Very small quantities (D in m²/s, β in m/s). */
  small: { significant: 4 },
  /** Anything without a unit (factors, ratios). */
  plain: { significant: 6 },
} as const satisfies Record<string, OutputPrecision>;

/** A number rounded as `precision` says; whole numbers and non-finite values as they are. */
export function roundForOutput(value: number, precision: OutputPrecision): number {
  if (!Number.isFinite(value) || Number.isInteger(value)) return value;
  const rounded =
    'decimals' in precision
      ? Number(value.toFixed(precision.decimals))
      : Number(value.toPrecision(precision.significant));
  return Object.is(rounded, -0) ? 0 : rounded;
}
