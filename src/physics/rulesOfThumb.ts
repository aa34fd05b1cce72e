/**
 * Harris (1943), Metal Progress: total case depth for a surface held at
 * saturation, counting time at temperature only.
 * Published form: d (in) = 31.6·√t / 10^(6700/T_R), t in hours, T in °R.
 */
import { convertTemperature, MM_PER_INCH } from './units';

/** Harris total case depth in inches; t in hours, T in °F. */
export function harrisTotalCaseDepthIn(timeH: number, tempF: number): number {
  const tempR = convertTemperature(tempF, 'F', 'R');
  return (31.6 * Math.sqrt(timeH)) / 10 ** (6700 / tempR);
}

/** Harris total case depth in mm; t in hours, T in °C (the metric form of the same formula). */
export function harrisTotalCaseDepthMm(timeH: number, tempC: number): number {
  return harrisTotalCaseDepthIn(timeH, convertTemperature(tempC, 'C', 'F')) * MM_PER_INCH;
}
