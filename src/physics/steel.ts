/**
 * Limits and alloy effects of carburizing steels: where austenite exists (A1, the core's Ac3),
 * saturation (Acm), the alloy factor on surface carbon, and the depth thresholds.
 */
import { interpolateTable } from './interpolate';

/** A1, the eutectoid temperature of the Fe–Fe₃C diagram, °C: austenite exists only above it. */
export const EUTECTOID_TEMP_C = 727;

/** There is austenite to carburize at this temperature (above A1; at A1 itself, none yet). */
export const hasAustenite = (tempC: number): boolean => tempC > EUTECTOID_TEMP_C;

/** Share of a linear ramp's duration, from its start (0) to its end (1). */
export interface RampSpan {
  from: number;
  until: number;
}

/**
 * The part of a linear ramp from `startC` to `endC` spent above A1, as shares of its duration;
 * undefined when it never rises above A1. A soak is all or nothing. Equivalent time and the
 * cycle solver both cut ramps here, so nothing happens before a heat-up crosses A1.
 */
export function austeniteSpan(startC: number, endC: number): RampSpan | undefined {
  const startHot = hasAustenite(startC);
  const endHot = hasAustenite(endC);
  if (!startHot && !endHot) return undefined;
  if (startHot && endHot) return { from: 0, until: 1 };
  const crossing = (EUTECTOID_TEMP_C - startC) / (endC - startC);
  return endHot ? { from: crossing, until: 1 } : { from: 0, until: crossing };
}

/**
 * Carbon solubility limit of austenite (the Acm line), wt% against °C.
 * 727 °C → 0.77 and 1148 °C → 2.11 are the eutectoid and eutectic points of the
 * Fe–Fe₃C diagram (widely tabulated); the points between are approximate, from memory
 * (±0.05 %C). Above the eutectic austenite holds at most about 2.11 %C (the solidus falls
 * from there); the last row carries it to 1150 °C, the hottest temperature accepted.
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
  [1150, 2.11],
];

/** Saturation carbon of austenite at a temperature, wt%; undefined outside 727–1150 °C. */
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
 * Gunnarson (1963), alloy factor (from memory): log10(%C_plain / %C_alloy) = 0.055·Si − 0.013·Mn
 * − 0.040·Cr + 0.014·Ni − 0.013·Mo (wt%). Si and Ni raise the activity of carbon in austenite
 * (less carbon at the same potential); Cr, Mn and Mo lower it (more carbon).
 */
export const GUNNARSON_COEFFICIENTS: Readonly<Composition> = {
  Si: 0.055,
  Mn: -0.013,
  Cr: -0.04,
  Ni: 0.014,
  Mo: -0.013,
};

/** Σ coefficient × wt% over the alloying elements. */
const linearIn = (c: Composition, coefficients: Readonly<Partial<Composition>>) =>
  ALLOY_ELEMENTS.reduce((sum, e) => sum + (coefficients[e] ?? 0) * c[e], 0);

/** Surface carbon of an alloy steel over the plain-carbon value for the same atmosphere (Gunnarson): 10^−Σ. */
export function alloyFactor(c: Composition): number {
  return 10 ** -linearIn(c, GUNNARSON_COEFFICIENTS);
}

/**
 * Andrews (1965), J. Iron Steel Inst. 203, 721 (from memory): Ac3 (°C) = 910 − 203·√C − 15.2·Ni
 * + 44.7·Si + 31.5·Mo − 30·Mn − 11·Cr (+ 104·V + 13.1·W − 20·Cu + …, elements not recorded here),
 * wt%. Above it a steel is all austenite; between A1 and Ac3 ferrite and austenite coexist. The
 * Mn and Cr terms belong to the paper's full linear formula; without them (a shorter form that is
 * also quoted) Mn–Cr steels such as 20MnCr5 come out about 50 °C too high, although manganese
 * widens the austenite field.
 */
export const ANDREWS_AC3 = {
  baseC: 910,
  sqrtCarbon: -203,
  elements: { Ni: -15.2, Si: 44.7, Mo: 31.5, Mn: -30, Cr: -11 },
} as const;

/** Ac3 of a steel of this carbon and composition, °C (Andrews 1965). */
export function ac3TempC(carbonPct: number, c?: Composition): number {
  const alloy = c ? linearIn(c, ANDREWS_AC3.elements) : 0;
  return ANDREWS_AC3.baseC + ANDREWS_AC3.sqrtCarbon * Math.sqrt(Math.max(carbonPct, 0)) + alloy;
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
