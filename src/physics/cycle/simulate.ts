/**
 * The `simulate` command: a multi-step carburizing cycle in, final surface carbon, case
 * depths, carbon profile, surface history and cautions out.
 */
import { DIFFUSIVITY_MODELS, DEFAULT_MODEL, scaledDiffusivity, type DiffusivityFunction } from '../diffusivity';
import { indicativeHardnessBasis, indicativeHardnessHrc } from '../indicativeHardness';
import { fail, ok, type Result } from '../result';
import { DEFAULT_ECD_THRESHOLD_PCT, totalCaseThresholdPct } from '../steel';
import { SECONDS_PER_HOUR } from '../units';
import { DiffusivityTable } from './diffusivityTable';
import { buildGrid } from './grid';
import { depthToCarbonM, profileDepthM, sampleProfile } from './profile';
import type { PartShape, Recipe, SimulationResult, SurfaceHistoryPoint } from './recipe';
import { readRecipe } from './readRecipe';
import { solveCycle, type SolverRun } from './solver';
import { scheduleTimeSteps } from './timeSchedule';
import { cycleWarnings } from './warnings';

/** Resolution factors accepted by runCycle: coarser than 1/4 is meaningless, finer than 64× is slow. */
export const RESOLUTION_LIMITS = { min: 0.25, max: 64 } as const;

export interface CycleOptions {
  /** Grid and time-step refinement factor: 2 halves cell widths and time steps. Default 1. */
  resolution?: number;
  /**
   * Replaces the recipe's diffusivity model (tests only: constant D for the closed-form checks).
   * A furnace's factor is the recipe's `diffusivityFactor`, applied to either.
   */
  diffusivity?: DiffusivityFunction;
}

/** The modelled depth and, for a bar, its radius, m. */
function domain(shape: PartShape, semiInfiniteDepthM: number): { extentM: number; radiusM?: number } {
  if (shape.kind === 'plate') return { extentM: Math.min(shape.thicknessMm / 2e3, semiInfiniteDepthM) };
  if (shape.kind === 'bar') {
    const radiusM = shape.diameterMm / 2e3;
    return { extentM: Math.min(radiusM, semiInfiniteDepthM), radiusM };
  }
  return { extentM: semiInfiniteDepthM };
}

/** Solves a validated recipe; returns the raw grid state (tests read mass balance from it). */
export function solveRecipe(recipe: Recipe, options: CycleOptions = {}): SolverRun {
  const requested = options.resolution ?? 1;
  const resolution = Number.isFinite(requested)
    ? Math.min(Math.max(requested, RESOLUTION_LIMITS.min), RESOLUTION_LIMITS.max)
    : 1;
  const diffusivity = scaledDiffusivity(
    options.diffusivity ?? DIFFUSIVITY_MODELS[recipe.model ?? DEFAULT_MODEL].diffusivity,
    recipe.diffusivityFactor ?? 1,
  );
  const schedule = scheduleTimeSteps(recipe, diffusivity, resolution);
  const { extentM, radiusM } = domain(recipe.shape ?? { kind: 'semi-infinite' }, schedule.semiInfiniteDepthM);
  const grid = buildGrid(extentM, resolution, radiusM);
  const table = new DiffusivityTable(diffusivity, schedule.minCarbonPct, schedule.maxCarbonPct, resolution);
  return solveCycle(schedule.steps, grid, table, recipe.steel.coreCarbonPct);
}

function surfaceHistory(run: SolverRun): SurfaceHistoryPoint[] {
  const points: SurfaceHistoryPoint[] = [];
  for (let i = 0; i < run.historyLength; i++) {
    points.push({ timeH: run.historyTimeS[i]! / SECONDS_PER_HOUR, carbonPct: run.historySurfacePct[i]! });
  }
  return points;
}

/** Simulation result of a validated recipe. */
export function runCycle(
  recipe: Recipe,
  resolution = 1,
  options: Omit<CycleOptions, 'resolution'> = {},
): SimulationResult {
  const run = solveRecipe(recipe, { ...options, resolution });
  const thresholdCarbonPct = recipe.thresholdCarbonPct ?? DEFAULT_ECD_THRESHOLD_PCT;
  const effectiveM = depthToCarbonM(run, thresholdCarbonPct);
  const totalM = depthToCarbonM(run, totalCaseThresholdPct(recipe.steel.coreCarbonPct, recipe.totalCaseMarginPct));
  const totalCaseDepthMm = totalM * 1e3;
  const hardness = indicativeHardnessBasis({ ...recipe, thresholdCarbonPct });
  return {
    effectiveCaseDepthMm: effectiveM * 1e3,
    totalCaseDepthMm,
    surfaceCarbonPct: run.surfaceCarbonPct,
    profile: sampleProfile(run, profileDepthM(run, totalM), (c) => indicativeHardnessHrc(c, hardness.basis)),
    surfaceHistory: surfaceHistory(run),
    hardnessBasis: hardness.basis,
    warnings: [...cycleWarnings(recipe, run, totalCaseDepthMm), ...hardness.warnings],
  };
}

/**
 * The depth (mm) at which a validated recipe's final carbon profile falls to any level: one solve,
 * then read off at as many levels as asked (the plant threshold's fit reads two per load and factor).
 */
export function carbonDepthsOfCycle(recipe: Recipe, resolution = 1): (carbonPct: number) => number {
  const run = solveRecipe(recipe, { resolution });
  return (carbonPct) => depthToCarbonM(run, carbonPct) * 1e3;
}

/** Every number a result shows is finite (a last guard; the scheme keeps carbon bounded). */
function allFinite(result: SimulationResult): boolean {
  const { effectiveCaseDepthMm, totalCaseDepthMm, surfaceCarbonPct, profile, surfaceHistory: history } = result;
  return (
    Number.isFinite(effectiveCaseDepthMm + totalCaseDepthMm + surfaceCarbonPct) &&
    profile.every((p) => Number.isFinite(p.depthMm + p.carbonPct + p.hardnessHrc)) &&
    history.every((p) => Number.isFinite(p.timeH + p.carbonPct))
  );
}

/** `simulate`: request → validated recipe (a calibrated furnace's factor included) → simulation, or a typed error. */
export function simulateCycle(request: unknown): Result<SimulationResult> {
  const recipe = readRecipe(request);
  if (!recipe.ok) return recipe;
  const result = runCycle(recipe.value);
  return allFinite(result) ? ok(result) : fail('solve.noConvergence', 'steps');
}
