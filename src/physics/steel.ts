/**
 * Limits and alloy effects of carburizing steels: saturation (Acm), the alloy
 * factor on surface carbon, and the depth thresholds.
 */
import { interpolateTable } from './interpolate';

/**
 * Carbon solubility limit of austenite (the Acm line), wt% against °C.
 * 727 °C → 0.77 and 1148 °C → 2.11 are the eutectoid and eutectic points of the
 * Fe–Fe₃C diagram (widely tabulated); the points between are approximate, from memory.
 */
export const ACM_TABLE: readonly (readonly [number, number])[] = [
  [727, 0.77],
  [800, 0.95],
  [850, 1.07],
  [900, 1.2],
  [950, 1.34],
  [1000, 1.48],
  [1050, 1.64],
  [1100, 1.83],
  [1148, 2.11],
];

/** Saturation carbon of austenite at a temperature, wt%; undefined outside 727–1148 °C. */
export function saturationCarbonPct(tempC: number): number | undefined {
  return interpolateTable(ACM_TABLE, tempC);
}

/** Alloying elements that shift the carbon a given atmosphere gives the steel, wt%. */
export interface Composition {
  Si: number;
  Mn: number;
  Cr: number;
  Ni: number;
  Mo: number;
}

export const ALLOY_ELEMENTS = ['Si', 'Mn', 'Cr', 'Ni', 'Mo'] as const;

/** Upper limit accepted for each element, wt% (beyond carburizing grades; keeps the fit in range). */
export const ALLOY_ELEMENT_MAX_PCT = 10;

/**
 * Gunnarson (1963), alloy factor (from memory): the surface carbon of an alloy steel equals
 * the plain-carbon value for the same atmosphere × 10^(0.055·Si − 0.013·Mn − 0.040·Cr + 0.014·Ni − 0.013·Mo).
 */
export function alloyFactor(c: Composition): number {
  return 10 ** (0.055 * c.Si - 0.013 * c.Mn - 0.04 * c.Cr + 0.014 * c.Ni - 0.013 * c.Mo);
}

/** ECD threshold carbon: a stand-in for where the hardness falls to the case criterion after quench and temper (common practice; it depends on the steel and the quench), wt%. */
export const DEFAULT_ECD_THRESHOLD_PCT = 0.4;
/** Total case ends where carbon is core + 0.05 %C (common practice), wt%. */
export const TOTAL_CASE_MARGIN_PCT = 0.05;

/** Carbon where the total case ends: core plus a margin (default core + 0.05 %C, common practice). */
export function totalCaseThresholdPct(coreCarbonPct: number, marginPct = TOTAL_CASE_MARGIN_PCT): number {
  return coreCarbonPct + marginPct;
}

/** Highest carbon content accepted anywhere: the eutectic point of Fe–Fe₃C, 2.11 %C. */
export const MAX_CARBON_PCT = 2.11;
