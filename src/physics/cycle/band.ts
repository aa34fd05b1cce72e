/**
 * The likely range of a cycle's effective case depth: `depthBand` over the cycle simulator.
 * Each case runs the whole recipe with one diffusivity model, every step temperature moved by
 * the furnace tolerance, and (at the β corners) every carburizing step's β set to one end of
 * the β range. Identical cases are simulated once (23 runs with a β range, 9 without).
 */
import { DEFAULT_MODEL } from '../diffusivity';
import { DEFAULT_ECD_THRESHOLD_PCT } from '../steel';
import { depthBand, type BandCase, type DepthBand, type Range } from '../uncertainty';
import { depthToCarbonM } from './profile';
import type { Recipe } from './recipe';
import { solveRecipe } from './simulate';

/** The furnace's calibration factor on D is the recipe's own `diffusivityFactor`. */
export interface CycleBandOptions {
  /** Furnace temperature tolerance, ±°C (uncertainty.ts default when absent). */
  temperatureToleranceC?: number;
  /** Range of β, m/s; absent: each step keeps its own β. */
  betaRangeMPerS?: Range;
}

export interface CycleBand extends DepthBand {
  /** Simulator runs the band took. */
  simulations: number;
}

/** The recipe as one band case runs it: temperatures moved, β replaced when the case gives one. */
export function bandRecipe(recipe: Recipe, c: Pick<BandCase, 'tempOffsetC' | 'betaMPerS'>): Recipe {
  return {
    ...recipe,
    steps: recipe.steps.map((step) => ({
      ...step,
      startTempC: step.startTempC + c.tempOffsetC,
      endTempC: step.endTempC + c.tempOffsetC,
      ...(c.betaMPerS === undefined ? {} : { betaMPerS: c.betaMPerS }),
    })),
  };
}

/** Band on the effective case depth of a validated recipe (depths in mm). */
export function cycleDepthBand(recipe: Recipe, options: CycleBandOptions = {}): CycleBand {
  const thresholdPct = recipe.thresholdCarbonPct ?? DEFAULT_ECD_THRESHOLD_PCT;
  const cache = new Map<string, number>();
  const predict = (c: BandCase): number => {
    const key = `${c.model}|${c.tempOffsetC}|${c.betaMPerS ?? ''}`;
    let ecdMm = cache.get(key);
    if (ecdMm === undefined) {
      const run = solveRecipe({ ...bandRecipe(recipe, c), model: c.model });
      ecdMm = depthToCarbonM(run, thresholdPct) * 1e3;
      cache.set(key, ecdMm);
    }
    return ecdMm;
  };
  const band = depthBand(predict, recipe.model ?? DEFAULT_MODEL, {
    ...(options.temperatureToleranceC === undefined ? {} : { temperatureToleranceC: options.temperatureToleranceC }),
    ...(options.betaRangeMPerS ? { betaRangeMPerS: options.betaRangeMPerS } : {}),
  });
  return { ...band, simulations: cache.size };
}
