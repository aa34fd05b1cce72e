/**
 * Diffusivity of carbon in austenite, D(C, T), from three published models.
 * All functions take T in kelvin and carbon in wt% and return D in m²/s.
 * Their spread is real model uncertainty (modelSpread: over 850–1050 °C and 0.1–1.2 %C,
 * Tibbetts −4 to +26 % and Wells–Batz–Mehl −30 to +27 % of Ågren, up to 1.8× between models);
 * callers show it rather than hide it.
 */
import { carbonWtPctToMoleFraction, celsiusToKelvin } from './units';

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
 * Wells, Batz & Mehl (1950), Trans. AIME 188, 553, in the form quoted in the carburizing
 * literature (from memory, not checked against the paper):
 * D = (0.07 + 0.06·C) · exp[−32000/(R·T)] cm²/s, C in wt%, R = 1.987 cal/(mol·K).
 * Its carbon dependence is much weaker than Ågren's or Tibbetts' (carbonDependence).
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

/** Range of temperature and carbon over which the three models were compared (their spread there: modelSpread). */
export const MODEL_CALIBRATED_RANGE = { minTempC: 850, maxTempC: 1050, minCarbonPct: 0.1, maxCarbonPct: 1.2 } as const;

/** Where a model's carbon dependence is stated: D at 1.0 %C over D at 0.1 %C, at 1000 °C. */
export const CARBON_DEPENDENCE_POINT = { tempC: 1000, lowPct: 0.1, highPct: 1 } as const;

/** D(1.0 %C) / D(0.1 %C) at 1000 °C: how strongly a model's D rises with carbon. */
export function carbonDependence(model: DiffusivityModelId): number {
  const { tempC, lowPct, highPct } = CARBON_DEPENDENCE_POINT;
  const D = DIFFUSIVITY_MODELS[model].diffusivity;
  const tempK = celsiusToKelvin(tempC);
  return D(tempK, highPct) / D(tempK, lowPct);
}

export interface ModelSpread {
  /** Each model's D relative to Ågren's, as fractions (−0.3 = 30 % lower), lowest and highest over the range. */
  relativeToAgren: Record<DiffusivityModelId, { min: number; max: number }>;
  /** Largest ratio of the highest to the lowest of the three D at one temperature and carbon. */
  maxRatio: number;
}

/**
 * The spread of the three models over MODEL_CALIBRATED_RANGE, on a grid of 5 °C and 0.05 %C
 * (their ratios are monotonic in T and C, so the extremes fall on the corners, which the grid holds).
 */
export function modelSpread(): ModelSpread {
  const r = MODEL_CALIBRATED_RANGE;
  const relativeToAgren = Object.fromEntries(MODEL_IDS.map((id) => [id, { min: Infinity, max: -Infinity }])) as Record<
    DiffusivityModelId,
    { min: number; max: number }
  >;
  let maxRatio = 1;
  for (let tempC: number = r.minTempC; tempC <= r.maxTempC; tempC += 5) {
    for (let k = 0; r.minCarbonPct + 0.05 * k <= r.maxCarbonPct + 1e-9; k++) {
      const tempK = celsiusToKelvin(tempC);
      const carbonPct = r.minCarbonPct + 0.05 * k;
      const values = MODEL_IDS.map((id) => DIFFUSIVITY_MODELS[id].diffusivity(tempK, carbonPct));
      const agren = DIFFUSIVITY_MODELS.agren.diffusivity(tempK, carbonPct);
      MODEL_IDS.forEach((id, i) => {
        const relative = values[i]! / agren - 1;
        relativeToAgren[id].min = Math.min(relativeToAgren[id].min, relative);
        relativeToAgren[id].max = Math.max(relativeToAgren[id].max, relative);
      });
      maxRatio = Math.max(maxRatio, Math.max(...values) / Math.min(...values));
    }
  }
  return { relativeToAgren, maxRatio };
}

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
