/**
 * The `plan` command: boost and diffuse times for a drawing's effective case depth and surface
 * carbon, found by root finding on the cycle simulator (search.ts), rounded, then simulated
 * forward in full. `reachable` only when that forward run meets both ranges with potentials
 * below saturation; otherwise `binding` says what stops it and `suggestions` what would help.
 */
import type { Recipe, SimulationResult } from '../cycle/recipe';
import { fail, ok, type Result, type Warning } from '../result';
import { saturationFinding, searchFinding, type Finding } from './findings';
import { PlanModel } from './planModel';
import { MIN_CARBURIZE_H, readPlanRequest, type PlanRequest, type TargetRange } from './readPlanRequest';
import { searchPlan, type Aim, type SearchOutcome } from './search';

/** The diffuse step keeps at least a tenth of the carburizing time: our rule, so a plan is a real two-step cycle. */
export const MAX_BOOST_SHARE = 0.9;
/** Plan times are rounded to this, h (3.6 s): at most 0.25 % of the shortest carburizing time considered (0.1 h). */
export const TIME_ROUNDING_H = 0.001;
/** Solver resolution of the runs during the search (measured: see the planner bench). */
export const SEARCH_RESOLUTION = 0.5;
/** Resolution of the forward run that checks the plan (the simulator's default). */
export const VERIFY_RESOLUTION = 1;

export interface PlanOptions {
  searchResolution?: number;
  verifyResolution?: number;
}

export interface PlanResult {
  /** The forward run of this plan meets both target ranges, with no potential above saturation. */
  reachable: boolean;
  boostH: number;
  diffuseH: number;
  /** Hardening soak, h (0 without one). */
  hardeningH: number;
  totalH: number;
  /** Forward simulation of the plan at the simulator's default resolution. */
  predicted: { effectiveCaseDepthMm: number; surfaceCarbonPct: number; totalCaseDepthMm: number };
  /** What stops the targets being met, when they are not. */
  binding?: Warning;
  /** Changes that would make the targets reachable (estimates). */
  suggestions: Warning[];
  /** What the search aimed at: the middle of what is both wanted and reachable (out of reach: the nearest target limit). */
  aim?: { effectiveCaseDepthMm: number; surfaceCarbonPct: number };
  /** Surface carbon that plans of the aimed depth can leave, from most diffuse to most boost, wt%. */
  surfaceRangePct?: TargetRange;
  /** Cautions of the forward simulation, by recipe step. */
  warnings: Warning[];
  /** The planned cycle, ready for the cycle screen or `simulate`. */
  recipe: Recipe;
  /** Simulator runs this plan took. */
  simulations: number;
}

const roundTime = (h: number) => Math.round(h / TIME_ROUNDING_H) / Math.round(1 / TIME_ROUNDING_H);
const within = (value: number, range: TargetRange) => value >= range.min && value <= range.max;

/** Boost and diffuse hours of a search point, rounded, within the time limit. */
function roundedTimes(outcome: SearchOutcome, maxCarburizeH: number): { boostH: number; diffuseH: number } {
  const { boostShare, carburizeH } = outcome.point;
  let totalH = roundTime(carburizeH);
  if (totalH > maxCarburizeH) totalH = roundTime(totalH - TIME_ROUNDING_H);
  const boostH = Math.min(roundTime(boostShare * carburizeH), totalH);
  return { boostH, diffuseH: roundTime(totalH - boostH) };
}

function missFinding(ecdMm: number, surfacePct: number): Finding {
  return {
    binding: {
      code: 'plan.missedInFinalCheck',
      params: { ecdMm: Number(ecdMm.toFixed(3)), surfacePct: Number(surfacePct.toFixed(3)) },
    },
    suggestions: [],
  };
}

const aimOf = (aim: Aim) => ({ effectiveCaseDepthMm: aim.ecdMm, surfaceCarbonPct: aim.surfacePct });

interface Attempt {
  outcome: SearchOutcome;
  boostH: number;
  diffuseH: number;
  recipe: Recipe;
  simulation: SimulationResult;
  meets: boolean;
}

/** Searches at `searchResolution`, rounds the times, and checks the plan forward at `verifyResolution`. */
function attempt(model: PlanModel, searchResolution: number, verifyResolution: number): Attempt {
  const { request, hardeningH } = model;
  const limits = {
    minCarburizeH: MIN_CARBURIZE_H,
    maxCarburizeH: request.maxTotalH - hardeningH,
    maxBoostShare: MAX_BOOST_SHARE,
  };
  const outcome = searchPlan(
    (boostShare, carburizeH) => model.probe(boostShare, carburizeH, searchResolution),
    limits,
    request.targetEcdMm,
    request.targetSurfaceCarbonPct,
  );
  const { boostH, diffuseH } = roundedTimes(outcome, limits.maxCarburizeH);
  const recipe = model.recipe(boostH, diffuseH);
  const simulation = model.simulate(recipe, verifyResolution);
  const meets =
    within(simulation.effectiveCaseDepthMm, request.targetEcdMm) &&
    within(simulation.surfaceCarbonPct, request.targetSurfaceCarbonPct);
  return { outcome, boostH, diffuseH, recipe, simulation, meets };
}

/** Plans a validated request. */
export function planForTargets(request: PlanRequest, options: PlanOptions = {}): PlanResult {
  const searchResolution = options.searchResolution ?? SEARCH_RESOLUTION;
  const verifyResolution = options.verifyResolution ?? VERIFY_RESOLUTION;
  const model = new PlanModel(request);
  const hardeningH = model.hardeningH;
  let tried = attempt(model, searchResolution, verifyResolution);
  const searchSaidMet = tried.outcome.kind === 'depthMet' && tried.outcome.surface === 'met';
  // Narrow targets on a steep profile can fall between the coarse search and the check: search again at the check's resolution.
  if (!tried.meets && searchSaidMet && searchResolution !== verifyResolution)
    tried = attempt(model, verifyResolution, verifyResolution);
  const { outcome, boostH, diffuseH, recipe, simulation, meets } = tried;
  const { effectiveCaseDepthMm, surfaceCarbonPct, totalCaseDepthMm } = simulation;
  const finding =
    saturationFinding(request) ??
    (meets
      ? undefined
      : (searchFinding(request, outcome, {
          hardeningH,
          hardeningOnlyEcdMm: () => model.probe(0, 0, searchResolution).ecdMm,
          shiftedEcdMm: (point, tempOffsetC) =>
            model.probe(point.boostShare, point.carburizeH, searchResolution, tempOffsetC).ecdMm,
        }) ?? missFinding(effectiveCaseDepthMm, surfaceCarbonPct)));
  return {
    reachable: finding === undefined,
    boostH,
    diffuseH,
    hardeningH,
    // The hardening soak is as given, so only float noise is rounded off the sum.
    totalH: Number((boostH + diffuseH + hardeningH).toFixed(9)),
    predicted: { effectiveCaseDepthMm, surfaceCarbonPct, totalCaseDepthMm },
    ...(finding ? { binding: finding.binding } : {}),
    suggestions: finding?.suggestions ?? [],
    ...(outcome.kind === 'depthMet' ? { aim: aimOf(outcome.aim), surfaceRangePct: outcome.surfaceRangePct } : {}),
    warnings: simulation.warnings,
    recipe,
    simulations: model.simulations,
  };
}

/** Every number anywhere inside a value is finite (a last guard before output). */
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (typeof value === 'object' && value !== null) return Object.values(value).every(allFinite);
  return true;
}

/** `plan`: request → validated targets → a two-step cycle plan, or a typed error. */
export function planTwoStepCycle(request: unknown): Result<PlanResult> {
  const plan = readPlanRequest(request);
  if (!plan.ok) return plan;
  const result = planForTargets(plan.value);
  return allFinite(result) ? ok(result) : fail('solve.noConvergence', 'targetEcdMm');
}
