/**
 * Planning a run before the time loop: each recipe step in SI units, how deep the grid
 * must reach, and how many time steps each recipe step gets and where they fall.
 */
import { EUTECTOID_TEMP_C } from '../equivalentTime';
import { alloyFactor } from '../steel';
import { celsiusToKelvin, SECONDS_PER_HOUR } from '../units';
import { DEFAULT_BETA_M_PER_S, type Recipe } from './recipe';
import { rampProgress, RAMP_SAMPLES, stepEndTimes } from './timeSteps';

/** D(T, C) in m²/s for T in K and carbon in wt%: a published model, or a stand-in in tests. */
export type DiffusivityFunction = (tempK: number, carbonPct: number) => number;

/** A model's D times a furnace calibration factor (the model itself when the factor is 1). */
export function scaledDiffusivity(diffusivity: DiffusivityFunction, factor: number): DiffusivityFunction {
  return factor === 1 ? diffusivity : (tempK, carbonPct) => factor * diffusivity(tempK, carbonPct);
}

/** Below the eutectoid there is no austenite: no diffusion, no carbon uptake (Fe–Fe₃C diagram). */
export const EUTECTOID_TEMP_K = celsiusToKelvin(EUTECTOID_TEMP_C);

/**
 * Semi-infinite domain depth in units of √(Σ D_max·t). With a closed far boundary the error
 * there is of order erfc(depth / √(Σ D_max·t)); at 6 it is below 1e-16 (Crank §3, image sources).
 */
export const DOMAIN_DEPTHS = 6;
/** Smallest domain, m: keeps the grid sound when nearly nothing diffuses. */
export const MIN_DOMAIN_M = 1e-5;
/**
 * Time steps of a recipe step at resolution 1: a floor, plus a share growing with √ of the
 * step's part of the cycle's ∫D dt (tuned by measurement: see the convergence tests).
 */
export const MIN_TIME_STEPS = 4;
export const SHARED_TIME_STEPS = 24;
/** Last over first time step within a recipe step: steps grow geometrically from a small start. */
export const TIME_STEP_STRETCH = 10;
/** Largest growth from one time step to the next; variable-step BDF2 is zero-stable below 1 + √2. */
export const MAX_TIME_STEP_GROWTH = 2;

export interface PlannedStep {
  durationS: number;
  startTempK: number;
  endTempK: number;
  /** Carbon potential × alloy factor, wt%; null for no transfer. */
  effectivePotentialPct: number | null;
  betaMPerS: number;
  /** End of each time step, s from the start of the recipe step; the last equals durationS. */
  endTimesS: Float64Array;
}

export interface Plan {
  steps: PlannedStep[];
  /** Carbon can only lie between the lowest and highest of core and potentials (maximum principle), wt%. */
  minCarbonPct: number;
  maxCarbonPct: number;
  /** Depth the semi-infinite part must be modelled to, m. */
  semiInfiniteDepthM: number;
}

function prepareStep(recipe: Recipe, index: number, factor: number): Omit<PlannedStep, 'endTimesS'> {
  const step = recipe.steps[index]!;
  return {
    durationS: step.durationH * SECONDS_PER_HOUR,
    startTempK: celsiusToKelvin(step.startTempC),
    endTempK: celsiusToKelvin(step.endTempC),
    effectivePotentialPct: step.carbonPotentialPct === null ? null : step.carbonPotentialPct * factor,
    betaMPerS: step.betaMPerS ?? DEFAULT_BETA_M_PER_S,
  };
}

/** The carbon among `carbonValues` where D is largest at `tempK` (D rises with carbon in every model, but tests may differ). */
function fastestCarbon(diffusivity: DiffusivityFunction, tempK: number, carbonValues: number[]): number {
  let best = carbonValues[0]!;
  for (const c of carbonValues) if (diffusivity(tempK, c) > diffusivity(tempK, best)) best = c;
  return best;
}

export function planCycle(recipe: Recipe, diffusivity: DiffusivityFunction, resolution: number): Plan {
  const factor = recipe.steel.composition ? alloyFactor(recipe.steel.composition) : 1;
  const prepared = recipe.steps.map((_, i) => prepareStep(recipe, i, factor));
  const core = recipe.steel.coreCarbonPct;
  const carbonValues = [core, ...prepared.map((s) => s.effectivePotentialPct ?? core)];
  // ∫D dt of each step at the fastest carbon: an upper bound of how far carbon can move.
  const progress = prepared.map((s) => {
    const hotK = Math.max(s.startTempK, s.endTempK);
    const carbon = fastestCarbon(diffusivity, hotK, carbonValues);
    if (s.startTempK !== s.endTempK) {
      const ramp = rampProgress(s.durationS, s.startTempK, s.endTempK, diffusivity, carbon);
      return { totalM2: ramp[RAMP_SAMPLES]!, ramp };
    }
    return { totalM2: hotK > EUTECTOID_TEMP_K ? diffusivity(hotK, carbon) * s.durationS : 0 };
  });
  const totalDt = progress.reduce((sum, p) => sum + p.totalM2, 0);
  const steps = prepared.map((step, i): PlannedStep => {
    const { totalM2, ramp } = progress[i]!;
    const share = totalDt > 0 ? totalM2 / totalDt : 0;
    const count = Math.ceil(resolution * (MIN_TIME_STEPS + SHARED_TIME_STEPS * Math.sqrt(share)));
    const growth = Math.min(TIME_STEP_STRETCH ** (1 / Math.max(count - 1, 1)), MAX_TIME_STEP_GROWTH);
    return { ...step, endTimesS: stepEndTimes(step.durationS, count, growth, ramp) };
  });
  const semiInfiniteDepthM = Math.max(DOMAIN_DEPTHS * Math.sqrt(totalDt), MIN_DOMAIN_M);
  return {
    steps,
    semiInfiniteDepthM,
    minCarbonPct: Math.min(...carbonValues),
    maxCarbonPct: Math.max(...carbonValues),
  };
}
