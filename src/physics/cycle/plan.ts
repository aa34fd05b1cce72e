/**
 * Planning a run before the time loop: each recipe step in SI units, how deep the grid
 * must reach, and how many time steps each recipe step gets.
 */
import { EUTECTOID_TEMP_C } from '../equivalentTime';
import { alloyFactor } from '../steel';
import { celsiusToKelvin, SECONDS_PER_HOUR } from '../units';
import { DEFAULT_BETA_M_PER_S, type Recipe } from './recipe';

/** D(T, C) in m²/s for T in K and carbon in wt%: a published model, or a stand-in in tests. */
export type DiffusivityFunction = (tempK: number, carbonPct: number) => number;

/** Below the eutectoid there is no austenite: no diffusion, no carbon uptake (Fe–Fe₃C diagram). */
export const EUTECTOID_TEMP_K = celsiusToKelvin(EUTECTOID_TEMP_C);

/**
 * Semi-infinite domain depth in units of √(Σ D_max·t). With a closed far boundary the error
 * there is of order erfc(depth / √(Σ D_max·t)); at 6 it is below 1e-16 (Crank §3, image sources).
 */
export const DOMAIN_DEPTHS = 6;
/** Smallest domain, m: keeps the grid sound when nearly nothing diffuses. */
export const MIN_DOMAIN_M = 1e-5;
/** Time steps of a recipe step at resolution 1: a floor, plus a share by the step's diffusion. */
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
  timeSteps: number;
  /** Ratio of each time step to the one before. */
  growth: number;
}

export interface Plan {
  steps: PlannedStep[];
  /** Carbon can only lie between the lowest and highest of core and potentials (maximum principle), wt%. */
  minCarbonPct: number;
  maxCarbonPct: number;
  /** Depth the semi-infinite part must be modelled to, m. */
  semiInfiniteDepthM: number;
}

function prepareStep(recipe: Recipe, index: number, factor: number): Omit<PlannedStep, 'timeSteps' | 'growth'> {
  const step = recipe.steps[index]!;
  return {
    durationS: step.durationH * SECONDS_PER_HOUR,
    startTempK: celsiusToKelvin(step.startTempC),
    endTempK: celsiusToKelvin(step.endTempC),
    effectivePotentialPct: step.carbonPotentialPct === null ? null : step.carbonPotentialPct * factor,
    betaMPerS: step.betaMPerS ?? DEFAULT_BETA_M_PER_S,
  };
}

/** Upper bound of D during a step: hottest point, richest carbon the cycle can reach; 0 below the eutectoid. */
function maxDiffusivity(diffusivity: DiffusivityFunction, startTempK: number, endTempK: number, carbonValues: number[]): number {
  const tempK = Math.max(startTempK, endTempK);
  if (tempK <= EUTECTOID_TEMP_K) return 0;
  return Math.max(...carbonValues.map((c) => diffusivity(tempK, c)), 0);
}

export function planCycle(recipe: Recipe, diffusivity: DiffusivityFunction, resolution: number): Plan {
  const factor = recipe.steel.composition ? alloyFactor(recipe.steel.composition) : 1;
  const prepared = recipe.steps.map((_, i) => prepareStep(recipe, i, factor));
  const core = recipe.steel.coreCarbonPct;
  const carbonValues = [core, ...prepared.map((s) => s.effectivePotentialPct ?? core)];
  const Dt = prepared.map((s) => maxDiffusivity(diffusivity, s.startTempK, s.endTempK, carbonValues) * s.durationS);
  const totalDt = Dt.reduce((sum, v) => sum + v, 0);
  const steps = prepared.map((step, i): PlannedStep => {
    const share = totalDt > 0 ? Dt[i]! / totalDt : 0;
    const timeSteps = Math.ceil(resolution * (MIN_TIME_STEPS + SHARED_TIME_STEPS * Math.sqrt(share)));
    const growth = Math.min(TIME_STEP_STRETCH ** (1 / Math.max(timeSteps - 1, 1)), MAX_TIME_STEP_GROWTH);
    return { ...step, timeSteps, growth };
  });
  const semiInfiniteDepthM = Math.max(DOMAIN_DEPTHS * Math.sqrt(totalDt), MIN_DOMAIN_M);
  return { steps, semiInfiniteDepthM, minCarbonPct: Math.min(...carbonValues), maxCarbonPct: Math.max(...carbonValues) };
}
