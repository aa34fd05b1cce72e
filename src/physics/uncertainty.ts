/**
 * Uncertainty band on a predicted depth from three sources: the spread of the three
 * diffusivity models, the furnace temperature tolerance, and the range of β.
 * Method: evaluate the prediction at every combination of {each model} × {T − tol, T, T + tol}
 * × {β min, β max} (β only where the prediction uses it) and take the lowest and highest;
 * each source's own range varies it alone with the others at their nominal values.
 * Depth rises monotonically with T and β, so the corners bound the band.
 */
import { MODEL_IDS, type DiffusivityModelId } from './diffusivity';

/** Furnace temperature tolerance assumed when the settings give none, ±°C (common practice for a surveyed furnace). */
export const DEFAULT_TEMPERATURE_TOLERANCE_C = 8;
/** Range of β for endothermic gas, m/s (from memory; literature values scatter). */
export const DEFAULT_BETA_RANGE_M_PER_S = { min: 1e-7, max: 3e-7 } as const;

export interface BandCase {
  model: DiffusivityModelId;
  /** Added to every temperature of the cycle, °C. */
  tempOffsetC: number;
  /** β to use, m/s; undefined means the nominal β of the cycle. */
  betaMPerS?: number;
}

export interface Range {
  min: number;
  max: number;
}

export interface DepthBand {
  nominalMm: number;
  minMm: number;
  maxMm: number;
  models: Range;
  temperature: Range;
  beta?: Range;
  temperatureToleranceC: number;
}

export interface BandOptions {
  temperatureToleranceC?: number;
  /** Give it only when the prediction depends on β (surface transfer). */
  betaRangeMPerS?: Range;
}

const rangeOf = (values: number[]): Range => ({ min: Math.min(...values), max: Math.max(...values) });

/** The band around `predict` at its nominal model (depths in mm). */
export function depthBand(
  predict: (c: BandCase) => number,
  nominalModel: DiffusivityModelId,
  options: BandOptions = {},
): DepthBand {
  const tol = options.temperatureToleranceC ?? DEFAULT_TEMPERATURE_TOLERANCE_C;
  const betas: (number | undefined)[] = options.betaRangeMPerS
    ? [options.betaRangeMPerS.min, options.betaRangeMPerS.max]
    : [undefined];
  const offsets = [-tol, 0, tol];
  const corners: number[] = [];
  for (const model of MODEL_IDS) {
    for (const tempOffsetC of offsets) {
      for (const betaMPerS of betas)
        corners.push(predict({ model, tempOffsetC, ...(betaMPerS === undefined ? {} : { betaMPerS }) }));
    }
  }
  const nominalMm = predict({ model: nominalModel, tempOffsetC: 0 });
  return {
    nominalMm,
    minMm: Math.min(nominalMm, ...corners),
    maxMm: Math.max(nominalMm, ...corners),
    models: rangeOf(MODEL_IDS.map((model) => predict({ model, tempOffsetC: 0 }))),
    temperature: rangeOf(offsets.map((tempOffsetC) => predict({ model: nominalModel, tempOffsetC }))),
    ...(options.betaRangeMPerS
      ? {
          beta: rangeOf(
            betas.map((betaMPerS) =>
              predict({ model: nominalModel, tempOffsetC: 0, ...(betaMPerS === undefined ? {} : { betaMPerS }) }),
            ),
          ),
        }
      : {}),
    temperatureToleranceC: tol,
  };
}
