/**
 * Diffusivity of carbon in austenite, D(C, T), from three published models.
 * All functions take T in kelvin and carbon in wt% and return D in m²/s.
 * Their spread is real model uncertainty (up to ~25 % at the extremes of
 * 850–1050 °C and 0.1–1.2 %C); callers show it rather than hide it.
 */
import { carbonWtPctToMoleFraction } from './units';

export type DiffusivityModelId = 'agren' | 'tibbetts' | 'wells-batz-mehl';

/** D(T, C) in m²/s for T in K and carbon in wt%: a published model, or a stand-in in tests. */
export type DiffusivityFunction = (tempK: number, carbonPct: number) => number;

/** A model's D times a furnace calibration factor (the model itself when the factor is 1). */
export function scaledDiffusivity(diffusivity: DiffusivityFunction, factor: number): DiffusivityFunction {
  return factor === 1 ? diffusivity : (tempK, carbonPct) => factor * diffusivity(tempK, carbonPct);
}

export const DEFAULT_MODEL: DiffusivityModelId = 'agren';

/** Gas constant in cal/(mol·K), as used by the models published in calories. */
const R_CAL = 1.987;
const CM2_TO_M2 = 1e-4;

/**
 * Ågren (1986), Scripta Metallurgica 20, 1507:
 * D = 4.53e-7 · [1 + y(1 − y)·8339.9/T] · exp[−(1/T − 2.221e-4)·(17767 − 26436·y)] m²/s,
 * with y = x_C / (1 − x_C) the carbon site fraction.
 */
export function agrenDiffusivity(tempK: number, carbonPct: number): number {
  const x = carbonWtPctToMoleFraction(carbonPct);
  const y = x / (1 - x);
  return 4.53e-7 * (1 + (y * (1 - y) * 8339.9) / tempK) * Math.exp(-(1 / tempK - 2.221e-4) * (17767 - 26436 * y));
}

/**
 * Tibbetts (1980), J. Applied Physics 51, 4813:
 * D = 0.47 · exp(−1.6·C) · exp[−(37000 − 6600·C)/(R·T)] cm²/s, C in wt%, R = 1.987 cal/(mol·K).
 */
export function tibbettsDiffusivity(tempK: number, carbonPct: number): number {
  return 0.47 * Math.exp(-1.6 * carbonPct) * Math.exp(-(37000 - 6600 * carbonPct) / (R_CAL * tempK)) * CM2_TO_M2;
}

/**
 * Wells, Batz & Mehl (1950), Trans. AIME 188, 553 (form recalled from memory):
 * D = (0.07 + 0.06·C) · exp[−32000/(R·T)] cm²/s, C in wt%, R = 1.987 cal/(mol·K).
 */
export function wellsBatzMehlDiffusivity(tempK: number, carbonPct: number): number {
  return (0.07 + 0.06 * carbonPct) * Math.exp(-32000 / (R_CAL * tempK)) * CM2_TO_M2;
}

export interface DiffusivityModel {
  id: DiffusivityModelId;
  /** D in m²/s for T in K and carbon in wt%. */
  diffusivity: DiffusivityFunction;
  /** Short citation shown in the app and the CLI output. */
  source: string;
}

export const DIFFUSIVITY_MODELS: Readonly<Record<DiffusivityModelId, DiffusivityModel>> = {
  agren: { id: 'agren', diffusivity: agrenDiffusivity, source: 'Ågren (1986), Scripta Metallurgica 20, 1507' },
  tibbetts: { id: 'tibbetts', diffusivity: tibbettsDiffusivity, source: 'Tibbetts (1980), J. Appl. Phys. 51, 4813' },
  'wells-batz-mehl': {
    id: 'wells-batz-mehl',
    diffusivity: wellsBatzMehlDiffusivity,
    source: 'Wells, Batz & Mehl (1950), Trans. AIME 188, 553',
  },
};

export const MODEL_IDS = Object.keys(DIFFUSIVITY_MODELS) as DiffusivityModelId[];

export function isModelId(value: unknown): value is DiffusivityModelId {
  return typeof value === 'string' && Object.hasOwn(DIFFUSIVITY_MODELS, value);
}

/** Range of temperature and carbon over which the three models agree within ~25 %. */
export const MODEL_CALIBRATED_RANGE = { minTempC: 850, maxTempC: 1050, minCarbonPct: 0.1, maxCarbonPct: 1.2 } as const;

/**
 * The effective constant D for the closed-form solutions: the model evaluated at
 * the mean of surface and core carbon (common practice). m²/s.
 */
export function effectiveDiffusivity(
  model: DiffusivityModelId,
  tempK: number,
  surfaceCarbonPct: number,
  coreCarbonPct: number,
): number {
  return DIFFUSIVITY_MODELS[model].diffusivity(tempK, (surfaceCarbonPct + coreCarbonPct) / 2);
}
