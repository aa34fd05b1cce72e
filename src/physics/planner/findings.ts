/**
 * What binds when a plan cannot meet its targets, and what would make them reachable. Each
 * is a {code, params} under `warnings.plan.` in the locales, so the app and the CLI word them.
 * The numbers in suggestions are estimates from √(D·t) scaling and the equilibrium surface
 * carbon (potential × alloy factor); the planner itself does not rerun them. A suggestion never
 * leaves the models' range or the accepted inputs; when none is left, `plan.outOfReach` says so.
 */
import { DIFFUSIVITY_MODELS, MODEL_CALIBRATED_RANGE } from '../diffusivity';
import type { Warning } from '../result';
import { brentRoot } from '../rootFinding';
import { ac3TempC, ACM_TABLE, alloyFactor, saturationCarbonPct } from '../steel';
import { celsiusToKelvin } from '../units';
import { MAX_TIME_H, TEMPERATURE_LIMITS_C } from '../validate';
import type { PlanRequest } from './readPlanRequest';
import type { PlanPoint, SearchOutcome } from './search';

export interface Finding {
  binding: Warning;
  suggestions: Warning[];
}

/** Headroom below saturation worth suggesting a richer boost for, wt%. */
export const BOOST_HEADROOM_PCT = 0.03;
/** Suggested temperature changes are rounded to this, °C; total times to this, h. */
const TEMPERATURE_STEP_C = 5;
const TIME_STEP_H = 0.5;
/** Suggested potentials are rounded to this, wt%. */
const POTENTIAL_STEP_PCT = 0.01;

const round = (value: number, digits: number) => Number(value.toFixed(digits));
const ceilTo = (value: number, step: number) => round(Math.ceil(value / step - 1e-9) * step, 6);
const floorTo = (value: number, step: number) => round(Math.floor(value / step + 1e-9) * step, 6);
const middle = (range: { min: number; max: number }) => (range.min + range.max) / 2;

const factorOf = (request: PlanRequest) => (request.steel.composition ? alloyFactor(request.steel.composition) : 1);

/**
 * Carbon a potential gives at saturation's side: the potential itself (soot, plain-carbon carbides)
 * or, on a steel whose alloy factor exceeds 1, the surface it draws (potential × factor).
 */
const saturationLoad = (request: PlanRequest, potentialPct: number) => potentialPct * Math.max(1, factorOf(request));

/** Highest potential whose saturation load stays at most `limitPct`, rounded down, wt%. */
const highestPotentialPct = (request: PlanRequest, limitPct: number) =>
  floorTo(limitPct / Math.max(1, factorOf(request)), POTENTIAL_STEP_PCT);

/** Coolest temperature at which the diffuse potential is held (the hardening soak uses it too), °C. */
const diffuseLowestC = (request: PlanRequest) =>
  Math.min(request.diffuse.temperatureC, request.hardening?.temperatureC ?? Infinity);

/**
 * Temperatures a suggestion may move boost and diffuse to, °C: inside the range where the
 * diffusivity models were compared (and so inside the accepted inputs), above the core's Ac3 so
 * the core stays austenite, and warm enough that neither potential passes saturation.
 */
export function suggestedTemperatureRangeC(request: PlanRequest): { min: number; max: number } {
  const coolestSaturatedC = (potentialPct: number) => {
    const load = saturationLoad(request, potentialPct);
    const hotter = ACM_TABLE.find(([, pct]) => pct >= load);
    if (!hotter) return Infinity;
    if (hotter === ACM_TABLE[0]) return hotter[0];
    const root = brentRoot((c) => saturationCarbonPct(c)! - load, ACM_TABLE[0]![0], hotter[0], 1e-9);
    return root ? root.x : hotter[0];
  };
  const min = Math.max(
    MODEL_CALIBRATED_RANGE.minTempC,
    ac3TempC(request.steel.coreCarbonPct, request.steel.composition),
    coolestSaturatedC(request.boost.carbonPotentialPct),
    coolestSaturatedC(request.diffuse.carbonPotentialPct),
  );
  return { min, max: Math.min(MODEL_CALIBRATED_RANGE.maxTempC, TEMPERATURE_LIMITS_C.max) };
}

/** Carbon potentials (or the surface they draw) above saturation (Acm) at their temperature: soot and carbides, no acceptable plan. */
export function saturationFinding(request: PlanRequest): Finding | undefined {
  const factor = factorOf(request);
  const checks = [
    {
      codes: ['plan.boostPotentialAboveSaturation', 'plan.boostSurfaceAboveSaturation'],
      fix: 'plan.lowerBoostPotential',
      tempC: request.boost.temperatureC,
      potentialPct: request.boost.carbonPotentialPct,
    },
    {
      codes: ['plan.diffusePotentialAboveSaturation', 'plan.diffuseSurfaceAboveSaturation'],
      fix: 'plan.lowerDiffusePotential',
      tempC: diffuseLowestC(request),
      potentialPct: request.diffuse.carbonPotentialPct,
    },
  ] as const;
  for (const { codes, fix, tempC, potentialPct } of checks) {
    const limitPct = saturationCarbonPct(tempC);
    if (limitPct === undefined || !(saturationLoad(request, potentialPct) > limitPct)) continue;
    const params = { potentialPct, limitPct: round(limitPct, 2), tempC };
    const binding: Warning =
      potentialPct > limitPct
        ? { code: codes[0], params }
        : { code: codes[1], params: { ...params, surfacePct: round(potentialPct * factor, 3) } };
    const lowered = highestPotentialPct(request, limitPct);
    // A boost must stay richer than the diffuse step (an accepted input), a potential above zero.
    const acceptable =
      lowered > 0 && (fix === 'plan.lowerBoostPotential' ? lowered > request.diffuse.carbonPotentialPct : true);
    return {
      binding,
      suggestions: acceptable ? [{ code: fix, params: { potentialPct: lowered } }] : [outOfReach(request)],
    };
  }
  return undefined;
}

/**
 * Temperature change (°C, applied to boost and diffuse) that multiplies D by `ratio`, from the
 * diffusivity model at mid-case carbon; undefined when it would take either step out of
 * suggestedTemperatureRangeC.
 */
function temperatureChangeC(request: PlanRequest, ratio: number): number | undefined {
  if (!(ratio > 0) || !Number.isFinite(ratio)) return undefined;
  const diffusivity = DIFFUSIVITY_MODELS[request.model].diffusivity;
  const carbonPct = (middle(request.targetSurfaceCarbonPct) + request.steel.coreCarbonPct) / 2;
  const referenceC = request.boost.temperatureC;
  const logD = (tempC: number) => Math.log(diffusivity(celsiusToKelvin(tempC), carbonPct));
  const excess = (tempC: number) => logD(tempC) - logD(referenceC) - Math.log(ratio);
  const hottestC = Math.max(request.boost.temperatureC, request.diffuse.temperatureC);
  const coolestC = Math.min(request.boost.temperatureC, request.diffuse.temperatureC);
  const allowed = suggestedTemperatureRangeC(request);
  const [lo, hi] =
    ratio > 1
      ? [referenceC, referenceC + (allowed.max - hottestC)]
      : [referenceC - (coolestC - allowed.min), referenceC];
  if (!(hi > lo)) return undefined;
  const root = brentRoot(excess, lo, hi, 1e-9);
  if (root === undefined) return undefined;
  // Rounded to a suggestion's step, the change must still fit.
  const deltaC = root.x - referenceC;
  const shown = deltaC > 0 ? ceilTo(deltaC, TEMPERATURE_STEP_C) : -ceilTo(-deltaC, TEMPERATURE_STEP_C);
  return hottestC + shown <= allowed.max && coolestC + shown >= allowed.min ? shown : undefined;
}

/** Boost potential still below its highest acceptable value at the boost temperature: worth raising. */
function richerBoost(request: PlanRequest): Warning[] {
  const { temperatureC, carbonPotentialPct } = request.boost;
  const limitPct = saturationCarbonPct(temperatureC);
  if (limitPct === undefined) return [];
  const maxPotentialPct = highestPotentialPct(request, limitPct);
  return carbonPotentialPct < maxPotentialPct - BOOST_HEADROOM_PCT
    ? [
        {
          code: 'plan.raiseBoostPotential',
          params: { maxPotentialPct, limitPct: round(limitPct, 2), tempC: temperatureC },
        },
      ]
    : [];
}

/** Nothing inside the models' range and the accepted inputs helps: the targets are out of reach for these steps. */
function outOfReach(request: PlanRequest): Warning {
  const { min, max } = suggestedTemperatureRangeC(request);
  return { code: 'plan.outOfReach', params: { minC: round(min, 0), maxC: round(max, 0), maxTotalH: MAX_TIME_H } };
}

/** The suggestions, or the out-of-reach note when there are none. */
const orOutOfReach = (request: PlanRequest, suggestions: Warning[]): Warning[] =>
  suggestions.length > 0 ? suggestions : [outOfReach(request)];

/** Case depth out of reach within the time limit: longer, hotter, or a richer boost. */
function caseTooShallow(request: PlanRequest, point: PlanPoint, context: FindingContext): Finding {
  const reachedMm = point.probe.ecdMm;
  const ratio = (middle(request.targetEcdMm) / reachedMm) ** 2;
  const suggestions: Warning[] = [];
  const deltaC = temperatureChangeC(request, ratio);
  // √(D·t) scaling is an estimate; one run checks the change goes the right way.
  if (deltaC !== undefined && context.shiftedEcdMm(point, deltaC) > reachedMm)
    suggestions.push({ code: 'plan.raiseTemperature', params: { deltaC } });
  suggestions.push(...richerBoost(request));
  const totalH = ceilTo(point.carburizeH * ratio + context.hardeningH, TIME_STEP_H);
  if (totalH <= MAX_TIME_H) suggestions.push({ code: 'plan.allowMoreTime', params: { totalH } });
  return {
    binding: {
      code: 'plan.caseDepthNeedsMoreTime',
      params: { targetMm: request.targetEcdMm.min, reachedMm: round(reachedMm, 3), maxTotalH: request.maxTotalH },
    },
    suggestions: orOutOfReach(request, suggestions),
  };
}

/**
 * Even the shortest plan is too deep: a shorter hardening soak, or cooler boost and diffuse
 * steps unless the hardening soak alone already reaches past the target. In a short cycle the
 * surface transfer β rather than D sets the depth, and cooler steps may even go deeper (a
 * slower D keeps the carbon nearer the surface, richer): one run checks the change helps.
 */
function caseTooDeep(request: PlanRequest, point: PlanPoint, context: FindingContext): Finding {
  const { hardeningH } = context;
  const reachedMm = point.probe.ecdMm;
  const suggestions: Warning[] = [];
  const hardeningAloneMm = request.hardening ? context.hardeningOnlyEcdMm() : 0;
  const deltaC = temperatureChangeC(request, (middle(request.targetEcdMm) / reachedMm) ** 2);
  if (
    deltaC !== undefined &&
    hardeningAloneMm < request.targetEcdMm.max &&
    context.shiftedEcdMm(point, deltaC) < reachedMm
  ) {
    suggestions.push({ code: 'plan.lowerTemperature', params: { deltaC: -deltaC } });
  }
  if (request.hardening)
    suggestions.push({ code: 'plan.shortenHardening', params: { timeH: request.hardening.timeH } });
  return {
    binding: {
      code: 'plan.caseDepthTooDeepForShortestCycle',
      params: {
        targetMm: request.targetEcdMm.max,
        reachedMm: round(reachedMm, 3),
        totalH: round(point.carburizeH + hardeningH, 2),
      },
    },
    suggestions: orOutOfReach(request, suggestions),
  };
}

/**
 * A diffuse potential giving `surfacePct` at equilibrium, if it is a change the right way, stays
 * below saturation and below the boost potential (the boost must stay the richer step).
 */
function diffusePotentialFor(request: PlanRequest, surfacePct: number, raise: boolean): Warning[] {
  const potentialPct = (raise ? ceilTo : floorTo)(surfacePct / factorOf(request), POTENTIAL_STEP_PCT);
  const limitPct = saturationCarbonPct(diffuseLowestC(request));
  const currentPct = request.diffuse.carbonPotentialPct;
  if (!(potentialPct > 0) || (raise ? potentialPct <= currentPct : potentialPct >= currentPct)) return [];
  if (limitPct !== undefined && saturationLoad(request, potentialPct) > limitPct) return [];
  if (!(potentialPct < request.boost.carbonPotentialPct)) return [];
  return [{ code: raise ? 'plan.raiseDiffusePotential' : 'plan.lowerDiffusePotential', params: { potentialPct } }];
}

/** The surface target lies outside what plans of the aimed depth leave. */
function surfaceOutOfRange(
  request: PlanRequest,
  tooHigh: boolean,
  point: PlanPoint,
  rangePct: { min: number; max: number },
  hardeningH: number,
): Finding {
  const target = request.targetSurfaceCarbonPct;
  const aimPct = middle(target);
  const potentialPct = request.diffuse.carbonPotentialPct;
  if (!tooHigh) {
    return {
      binding: {
        code: 'plan.surfaceCarbonTooLowForDiffusePotential',
        params: { targetPct: target.max, reachedPct: round(rangePct.min, 3), potentialPct },
      },
      suggestions: orOutOfReach(request, diffusePotentialFor(request, aimPct, false)),
    };
  }
  const equilibriumPct = potentialPct * factorOf(request);
  if (target.min > equilibriumPct) {
    return {
      binding: {
        code: 'plan.surfaceCarbonTooHighForDiffusePotential',
        params: {
          targetPct: target.min,
          reachedPct: round(rangePct.max, 3),
          potentialPct,
          equilibriumPct: round(equilibriumPct, 3),
        },
      },
      suggestions: orOutOfReach(request, diffusePotentialFor(request, aimPct, true)),
    };
  }
  return {
    binding: {
      code: 'plan.surfaceCarbonTooHighForCycleTime',
      params: {
        targetPct: target.min,
        reachedPct: round(rangePct.max, 3),
        totalH: round(point.carburizeH + hardeningH, 2),
      },
    },
    suggestions: orOutOfReach(request, [...richerBoost(request), ...diffusePotentialFor(request, aimPct, true)]),
  };
}

export interface FindingContext {
  hardeningH: number;
  /** ECD of the hardening soak alone, mm (one more simulation, run only when needed). */
  hardeningOnlyEcdMm: () => number;
  /** ECD of a plan point with boost and diffuse `tempOffsetC` hotter, mm (one more simulation). */
  shiftedEcdMm: (point: PlanPoint, tempOffsetC: number) => number;
}

/** The finding of a search, if its targets are out of reach. */
export function searchFinding(
  request: PlanRequest,
  outcome: SearchOutcome,
  context: FindingContext,
): Finding | undefined {
  const { hardeningH } = context;
  if (outcome.kind === 'caseTooShallow') return caseTooShallow(request, outcome.point, context);
  if (outcome.kind === 'caseTooDeep') return caseTooDeep(request, outcome.point, context);
  if (outcome.surface === 'met') return undefined;
  return surfaceOutOfRange(request, outcome.surface === 'tooHigh', outcome.point, outcome.surfaceRangePct, hardeningH);
}
