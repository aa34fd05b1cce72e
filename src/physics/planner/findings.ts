/**
 * What binds when a plan cannot meet its targets, and what would make them reachable. Each
 * is a {code, params} under `warnings.plan.` in the locales, so the app and the CLI word them.
 * The numbers in suggestions are estimates from √(D·t) scaling and the equilibrium surface
 * carbon (potential × alloy factor); the planner itself does not rerun them.
 */
import { DIFFUSIVITY_MODELS } from '../diffusivity';
import { EUTECTOID_TEMP_C } from '../equivalentTime';
import type { Warning } from '../result';
import { brentRoot } from '../rootFinding';
import { alloyFactor, saturationCarbonPct } from '../steel';
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

const round = (value: number, digits: number) => Number(value.toFixed(digits));
const ceilTo = (value: number, step: number) => round(Math.ceil(value / step - 1e-9) * step, 6);
const floorTo = (value: number, step: number) => round(Math.floor(value / step + 1e-9) * step, 6);
const middle = (range: { min: number; max: number }) => (range.min + range.max) / 2;

const factorOf = (request: PlanRequest) => (request.steel.composition ? alloyFactor(request.steel.composition) : 1);

/** Coolest temperature at which the diffuse potential is held (the hardening soak uses it too), °C. */
const diffuseLowestC = (request: PlanRequest) =>
  Math.min(request.diffuse.temperatureC, request.hardening?.temperatureC ?? Infinity);

/** Carbon potentials above saturation (Acm) at their temperature: soot and carbides, no acceptable plan. */
export function saturationFinding(request: PlanRequest): Finding | undefined {
  const checks = [
    {
      code: 'plan.boostPotentialAboveSaturation',
      fix: 'plan.lowerBoostPotential',
      tempC: request.boost.temperatureC,
      potentialPct: request.boost.carbonPotentialPct,
    },
    {
      code: 'plan.diffusePotentialAboveSaturation',
      fix: 'plan.lowerDiffusePotential',
      tempC: diffuseLowestC(request),
      potentialPct: request.diffuse.carbonPotentialPct,
    },
  ] as const;
  for (const { code, fix, tempC, potentialPct } of checks) {
    const limitPct = saturationCarbonPct(tempC);
    if (limitPct === undefined || !(potentialPct > limitPct)) continue;
    return {
      binding: { code, params: { potentialPct, limitPct: round(limitPct, 2), tempC } },
      suggestions: [{ code: fix, params: { potentialPct: floorTo(limitPct, 0.01) } }],
    };
  }
  return undefined;
}

/**
 * Temperature change (°C, applied to boost and diffuse) that multiplies D by `ratio`, from the
 * diffusivity model at mid-case carbon; undefined when it would leave the accepted range.
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
  const [lo, hi] =
    ratio > 1
      ? [referenceC, referenceC + TEMPERATURE_LIMITS_C.max - hottestC]
      : [referenceC - (coolestC - EUTECTOID_TEMP_C - 1), referenceC];
  const root = brentRoot(excess, lo, hi, 1e-9);
  return root === undefined ? undefined : root.x - referenceC;
}

/** Boost potential still below saturation at the boost temperature: worth raising. */
function richerBoost(request: PlanRequest): Warning[] {
  const { temperatureC, carbonPotentialPct } = request.boost;
  const limitPct = saturationCarbonPct(temperatureC);
  return limitPct !== undefined && carbonPotentialPct < limitPct - BOOST_HEADROOM_PCT
    ? [{ code: 'plan.raiseBoostPotential', params: { limitPct: round(limitPct, 2), tempC: temperatureC } }]
    : [];
}

/** Case depth out of reach within the time limit: longer, hotter, or a richer boost. */
function caseTooShallow(request: PlanRequest, point: PlanPoint, hardeningH: number): Finding {
  const reachedMm = point.probe.ecdMm;
  const ratio = (middle(request.targetEcdMm) / reachedMm) ** 2;
  const suggestions: Warning[] = [];
  const deltaC = temperatureChangeC(request, ratio);
  if (deltaC !== undefined)
    suggestions.push({ code: 'plan.raiseTemperature', params: { deltaC: ceilTo(deltaC, TEMPERATURE_STEP_C) } });
  suggestions.push(...richerBoost(request));
  const totalH = ceilTo(point.carburizeH * ratio + hardeningH, TIME_STEP_H);
  if (totalH <= MAX_TIME_H) suggestions.push({ code: 'plan.allowMoreTime', params: { totalH } });
  return {
    binding: {
      code: 'plan.caseDepthNeedsMoreTime',
      params: { targetMm: request.targetEcdMm.min, reachedMm: round(reachedMm, 3), maxTotalH: request.maxTotalH },
    },
    suggestions,
  };
}

/**
 * Even the shortest plan is too deep: a shorter hardening soak, or cooler boost and diffuse
 * steps unless the hardening soak alone already reaches past the target.
 */
function caseTooDeep(request: PlanRequest, point: PlanPoint, context: FindingContext): Finding {
  const { hardeningH } = context;
  const reachedMm = point.probe.ecdMm;
  const suggestions: Warning[] = [];
  const hardeningAloneMm = request.hardening ? context.hardeningOnlyEcdMm() : 0;
  const deltaC = temperatureChangeC(request, (middle(request.targetEcdMm) / reachedMm) ** 2);
  if (deltaC !== undefined && hardeningAloneMm < request.targetEcdMm.max) {
    suggestions.push({ code: 'plan.lowerTemperature', params: { deltaC: ceilTo(-deltaC, TEMPERATURE_STEP_C) } });
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
    suggestions,
  };
}

/** A diffuse potential giving `surfacePct` at equilibrium, if it is a change the right way and stays below saturation. */
function diffusePotentialFor(request: PlanRequest, surfacePct: number, raise: boolean): Warning[] {
  const potentialPct = (raise ? ceilTo : floorTo)(surfacePct / factorOf(request), 0.01);
  const limitPct = saturationCarbonPct(diffuseLowestC(request));
  const currentPct = request.diffuse.carbonPotentialPct;
  if (!(potentialPct > 0) || (raise ? potentialPct <= currentPct : potentialPct >= currentPct)) return [];
  if (limitPct !== undefined && potentialPct > limitPct) return [];
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
      suggestions: diffusePotentialFor(request, aimPct, false),
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
      suggestions: diffusePotentialFor(request, aimPct, true),
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
    suggestions: [...richerBoost(request), ...diffusePotentialFor(request, aimPct, true)],
  };
}

export interface FindingContext {
  hardeningH: number;
  /** ECD of the hardening soak alone, mm (one more simulation, run only when needed). */
  hardeningOnlyEcdMm: () => number;
}

/** The finding of a search, if its targets are out of reach. */
export function searchFinding(
  request: PlanRequest,
  outcome: SearchOutcome,
  context: FindingContext,
): Finding | undefined {
  const { hardeningH } = context;
  if (outcome.kind === 'caseTooShallow') return caseTooShallow(request, outcome.point, hardeningH);
  if (outcome.kind === 'caseTooDeep') return caseTooDeep(request, outcome.point, context);
  if (outcome.surface === 'met') return undefined;
  return surfaceOutOfRange(request, outcome.surface === 'tooHigh', outcome.point, outcome.surfaceRangePct, hardeningH);
}
