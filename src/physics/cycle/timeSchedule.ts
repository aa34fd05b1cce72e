/**
 * The time-step schedule of a run, worked out before the time loop: each recipe step in SI
 * units with the part of it spent in austenite, how deep the grid must reach, and where the
 * time steps of each recipe step fall.
 */
import type { DiffusivityFunction } from '../diffusivity';
import { alloyFactor, austeniteSpan } from '../steel';
import { celsiusToKelvin, SECONDS_PER_HOUR } from '../units';
import { DEFAULT_BETA_M_PER_S, type Recipe, type RecipeStep } from './recipe';
import { rampProgress, RAMP_SAMPLES, rampSpacing, stepEndTimes } from './timeSteps';

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

/** The part of a recipe step with austenite, s from the start of the step. */
export interface AusteniteWindow {
  fromS: number;
  untilS: number;
}

export interface ScheduledStep {
  durationS: number;
  startTempK: number;
  endTempK: number;
  /** Carbon potential × alloy factor, wt%; null for no transfer. */
  effectivePotentialPct: number | null;
  betaMPerS: number;
  /**
   * When the step has austenite (above A1); undefined when it has none. Outside it nothing
   * diffuses and no carbon goes in, and a time step boundary lies on each of its ends.
   */
  austenite?: AusteniteWindow;
  /** End of each time step, s from the start of the recipe step; the last equals durationS. */
  endTimesS: Float64Array;
}

export interface TimeSchedule {
  steps: ScheduledStep[];
  /** Carbon can only lie between the lowest and highest of core and potentials (maximum principle), wt%. */
  minCarbonPct: number;
  maxCarbonPct: number;
  /** Depth the semi-infinite part must be modelled to, m. */
  semiInfiniteDepthM: number;
}

type PreparedStep = Omit<ScheduledStep, 'endTimesS'>;

function austeniteWindow(step: RecipeStep, durationS: number): AusteniteWindow | undefined {
  const span = austeniteSpan(step.startTempC, step.endTempC);
  return span && { fromS: span.from * durationS, untilS: span.until * durationS };
}

function prepareStep(step: RecipeStep, factor: number): PreparedStep {
  const durationS = step.durationH * SECONDS_PER_HOUR;
  const hot = austeniteWindow(step, durationS);
  return {
    durationS,
    startTempK: celsiusToKelvin(step.startTempC),
    endTempK: celsiusToKelvin(step.endTempC),
    effectivePotentialPct: step.carbonPotentialPct === null ? null : step.carbonPotentialPct * factor,
    betaMPerS: step.betaMPerS ?? DEFAULT_BETA_M_PER_S,
    ...(hot ? { austenite: hot } : {}),
  };
}

/** Furnace temperature at `timeS` into a step, K. */
const tempAt = (s: PreparedStep, timeS: number) => s.startTempK + ((s.endTempK - s.startTempK) * timeS) / s.durationS;

/** The carbon among `carbonValues` where D is largest at `tempK` (D rises with carbon in every model, but tests may differ). */
function fastestCarbon(diffusivity: DiffusivityFunction, tempK: number, carbonValues: number[]): number {
  let best = carbonValues[0]!;
  for (const c of carbonValues) if (diffusivity(tempK, c) > diffusivity(tempK, best)) best = c;
  return best;
}

/**
 * ∫D dt over a step's austenite window at the fastest carbon (an upper bound of how far carbon
 * moves), m², and, on a ramp, the measure its time steps are spaced in.
 */
function austeniteProgress(
  s: PreparedStep,
  diffusivity: DiffusivityFunction,
  carbonValues: number[],
): { totalM2: number; shareM2: number; ramp?: Float64Array } {
  const hot = s.austenite;
  if (!hot) return { totalM2: 0, shareM2: 0 };
  const fromK = tempAt(s, hot.fromS);
  const untilK = tempAt(s, hot.untilS);
  const carbon = fastestCarbon(diffusivity, Math.max(fromK, untilK), carbonValues);
  const lengthS = hot.untilS - hot.fromS;
  if (s.startTempK === s.endTempK) {
    const totalM2 = diffusivity(fromK, carbon) * lengthS;
    return { totalM2, shareM2: totalM2 };
  }
  const progress = rampProgress(lengthS, fromK, untilK, diffusivity, carbon);
  const ramp = rampSpacing(progress, lengthS, diffusivity(Math.max(fromK, untilK), carbon));
  return { totalM2: progress[RAMP_SAMPLES]!, shareM2: ramp[RAMP_SAMPLES]!, ramp };
}

/**
 * Time step ends of one recipe step: `count` steps growing geometrically over its austenite
 * window, plus one step for each part without austenite (before a heat-up crosses A1, after a
 * cool-down does). A step with no austenite at all is one time step in which nothing happens.
 */
function scheduleStep(s: PreparedStep, count: number, ramp: Float64Array | undefined): Float64Array {
  const hot = s.austenite;
  if (!hot) return Float64Array.of(s.durationS);
  const growth = Math.min(TIME_STEP_STRETCH ** (1 / Math.max(count - 1, 1)), MAX_TIME_STEP_GROWTH);
  const inside = stepEndTimes(hot.untilS - hot.fromS, count, growth, ramp);
  const before = hot.fromS > 0 ? [hot.fromS] : [];
  const after = hot.untilS < s.durationS ? [s.durationS] : [];
  const ends = [...before, ...Array.from(inside, (t) => hot.fromS + t), ...after];
  // The window's last end lies exactly on its edge, free of rounding in the sum above.
  ends[before.length + inside.length - 1] = hot.untilS;
  return Float64Array.from(ends);
}

export function scheduleTimeSteps(recipe: Recipe, diffusivity: DiffusivityFunction, resolution: number): TimeSchedule {
  const factor = recipe.steel.composition ? alloyFactor(recipe.steel.composition) : 1;
  const prepared = recipe.steps.map((step) => prepareStep(step, factor));
  const core = recipe.steel.coreCarbonPct;
  const carbonValues = [core, ...prepared.map((s) => s.effectivePotentialPct ?? core)];
  const progress = prepared.map((s) => austeniteProgress(s, diffusivity, carbonValues));
  const totalDt = progress.reduce((sum, p) => sum + p.totalM2, 0);
  const totalShare = progress.reduce((sum, p) => sum + p.shareM2, 0);
  const steps = prepared.map((step, i): ScheduledStep => {
    const { shareM2, ramp } = progress[i]!;
    const share = totalShare > 0 ? shareM2 / totalShare : 0;
    const count = Math.ceil(resolution * (MIN_TIME_STEPS + SHARED_TIME_STEPS * Math.sqrt(share)));
    return { ...step, endTimesS: scheduleStep(step, count, ramp) };
  });
  const semiInfiniteDepthM = Math.max(DOMAIN_DEPTHS * Math.sqrt(totalDt), MIN_DOMAIN_M);
  return {
    steps,
    semiInfiniteDepthM,
    minCarbonPct: Math.min(...carbonValues),
    maxCarbonPct: Math.max(...carbonValues),
  };
}
