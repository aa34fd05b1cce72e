/**
 * Hardness: the two scales a traverse is measured in, approximate Rockwell C ↔ Vickers
 * conversion, the two case criteria, and the fully martensitic ceiling from carbon.
 * Conversions are estimates; acceptance uses the lab's traverse and the standard's tables.
 */
import { interpolateTable } from './interpolate';

export const HARDNESS_UNITS = ['HRC', 'HV'] as const;
export type HardnessUnit = (typeof HARDNESS_UNITS)[number];

export interface Hardness {
  value: number;
  unit: HardnessUnit;
}

export function isHardnessUnit(value: unknown): value is HardnessUnit {
  return typeof value === 'string' && (HARDNESS_UNITS as readonly string[]).includes(value);
}

/** Plateau of as-quenched martensite hardness, HRC (Just, 1969, from memory). */
export const MAX_AS_QUENCHED_HRC = 65;

/** Carbon above which retained austenite often lowers surface hardness (common practice), wt%. */
export const RETAINED_AUSTENITE_CARBON_PCT = 0.9;

/**
 * Maximum as-quenched hardness of martensite, HRC ≈ 20 + 60·√C (Just, 1969, from memory),
 * levelling off at 65 HRC (reached near 0.56 %C): the fully martensitic ceiling. Real parts
 * fall below it where hardenability runs out; it is not the predicted traverse.
 */
export function asQuenchedHardnessHrc(carbonPct: number): number {
  return Math.min(20 + 60 * Math.sqrt(Math.max(carbonPct, 0)), MAX_AS_QUENCHED_HRC);
}

/**
 * HRC → HV rows of ASTM E140 Table 1 (values from memory, ±1 HV, approximate; the standard's
 * tables decide acceptance). Both columns rise, so linear interpolation between rows is monotone,
 * keeps every row exact and has an exact inverse; a monotone cubic would add curvature that rows
 * known to ±1 HV do not support.
 */
export const HRC_HV_TABLE: readonly (readonly [number, number])[] = [
  [20, 238],
  [25, 266],
  [30, 302],
  [35, 345],
  [40, 392],
  [41, 402],
  [42, 412],
  [43, 423],
  [44, 434],
  [45, 446],
  [46, 458],
  [47, 471],
  [48, 484],
  [49, 498],
  [50, 513],
  [51, 528],
  [52, 544],
  [53, 560],
  [54, 577],
  [55, 595],
  [56, 613],
  [57, 633],
  [58, 653],
  [59, 674],
  [60, 697],
  [61, 720],
  [62, 746],
  [63, 772],
  [64, 800],
  [65, 832],
  [66, 865],
  [67, 900],
  [68, 940],
];
const HV_HRC_TABLE = HRC_HV_TABLE.map(([hrc, hv]) => [hv, hrc] as const);

/** Where the conversion table reaches in each scale: 20–68 HRC, 238–940 HV. */
export const CONVERTIBLE_RANGE: Readonly<Record<HardnessUnit, { min: number; max: number }>> = {
  HRC: { min: HRC_HV_TABLE[0]![0], max: HRC_HV_TABLE[HRC_HV_TABLE.length - 1]![0] },
  HV: { min: HRC_HV_TABLE[0]![1], max: HRC_HV_TABLE[HRC_HV_TABLE.length - 1]![1] },
};

/**
 * Readings accepted in each scale. Rockwell C is used from 20 to 68 HRC (the table's rows).
 * Vickers reaches softer steel than Rockwell C: a core or an unhardened part below 238 HV
 * (20 HRC) is a valid Vickers reading that has no HRC value. Its lower bound, 80 HV, sits
 * below annealed low-carbon steel (about 100–130 HV, from memory) to catch slips (35 typed
 * under HV when HRC was meant); its upper bound is the table's top row, above any carburized case.
 */
export const HARDNESS_SCALE_RANGE: Readonly<Record<HardnessUnit, { min: number; max: number }>> = {
  HRC: CONVERTIBLE_RANGE.HRC,
  HV: { min: 80, max: CONVERTIBLE_RANGE.HV.max },
};

/** Approximate HV from HRC (20–68 HRC), linear between table rows; undefined outside the table. */
export function hrcToHv(hrc: number): number | undefined {
  return interpolateTable(HRC_HV_TABLE, hrc);
}

/** Approximate HRC from HV (238–940 HV), the inverse of hrcToHv; undefined outside the table. */
export function hvToHrc(hv: number): number | undefined {
  return interpolateTable(HV_HRC_TABLE, hv);
}

/** A hardness in another scale (approximate when the scales differ); undefined where the table ends. */
export function hardnessIn(hardness: Hardness, unit: HardnessUnit): number | undefined {
  if (hardness.unit === unit) return hardness.value;
  return unit === 'HV' ? hrcToHv(hardness.value) : hvToHrc(hardness.value);
}

/**
 * The two case criteria in use. They are different limits, not one limit in two scales:
 * 550 HV is about 52.4 HRC and 50 HRC about 513 HV by the table, so a case measured to
 * 50 HRC comes out deeper than the same case measured to 550 HV.
 */
export const CASE_CRITERIA = {
  /** ISO 18203:2016 (which replaced ISO 2639): effective case depth to 550 HV1 unless the drawing says otherwise. */
  'iso-18203': { value: 550, unit: 'HV' },
  /** SAE J423: effective case depth to 50 HRC. */
  'sae-j423': { value: 50, unit: 'HRC' },
} as const satisfies Record<string, Hardness>;

export type CaseCriterionId = keyof typeof CASE_CRITERIA;
export const CASE_CRITERION_IDS = Object.keys(CASE_CRITERIA) as CaseCriterionId[];
export const DEFAULT_CASE_CRITERION: CaseCriterionId = 'iso-18203';

export function isCaseCriterionId(value: unknown): value is CaseCriterionId {
  return typeof value === 'string' && Object.hasOwn(CASE_CRITERIA, value);
}
