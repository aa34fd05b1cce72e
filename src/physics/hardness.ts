/**
 * Indicative hardness from carbon, and approximate Rockwell C ↔ Vickers conversion.
 * Both are estimates; acceptance uses the lab's traverse and the standard's tables.
 */
import { interpolateTable } from './interpolate';

/** Plateau of as-quenched martensite hardness, HRC (Just, 1969, from memory). */
export const MAX_AS_QUENCHED_HRC = 65;

/** Carbon above which retained austenite often lowers surface hardness (common practice), wt%. */
export const RETAINED_AUSTENITE_CARBON_PCT = 0.9;

/**
 * Maximum as-quenched hardness of martensite, HRC ≈ 20 + 60·√C (Just, 1969, from memory),
 * levelling off at 65 HRC (reached near 0.56 %C). Indicative only.
 */
export function asQuenchedHardnessHrc(carbonPct: number): number {
  return Math.min(20 + 60 * Math.sqrt(Math.max(carbonPct, 0)), MAX_AS_QUENCHED_HRC);
}

/** HRC → HV pairs, ASTM E140 Table 1 (values from memory, approximate). */
export const HRC_HV_TABLE: readonly (readonly [number, number])[] = [
  [20, 238],
  [30, 302],
  [40, 392],
  [50, 513],
  [55, 595],
  [60, 697],
  [65, 832],
];
const HV_HRC_TABLE = HRC_HV_TABLE.map(([hrc, hv]) => [hv, hrc] as const);

/** Approximate HV from HRC (20–65 HRC), linear between table rows; undefined outside the table. */
export function hrcToHv(hrc: number): number | undefined {
  return interpolateTable(HRC_HV_TABLE, hrc);
}

/** Approximate HRC from HV (238–832 HV), the inverse of hrcToHv; undefined outside the table. */
export function hvToHrc(hv: number): number | undefined {
  return interpolateTable(HV_HRC_TABLE, hv);
}
