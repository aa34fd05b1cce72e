/** Requests and helpers shared by the planner tests. */
import { readFileSync } from 'node:fs';
import { expect } from 'vitest';
import { runCycle } from '../../../src/physics/cycle/simulate';
import type { Recipe, SimulationResult } from '../../../src/physics/cycle/recipe';
import { DIFFUSIVITY_MODELS, MODEL_CALIBRATED_RANGE } from '../../../src/physics/diffusivity';
import { saturationFinding } from '../../../src/physics/planner/findings';
import { readPlanRequest, type PlanRequest } from '../../../src/physics/planner/readPlanRequest';
import type { Warning } from '../../../src/physics/result';
import { alloyFactor, saturationCarbonPct } from '../../../src/physics/steel';

export const readExample = (file: string): string =>
  readFileSync(new URL(`../../../public/examples/${file}`, import.meta.url), 'utf8');

/** The demo pinion plan request (KR-2231, SAE 8620; invented scenario). */
export const pinionRequest = (): Record<string, unknown> => JSON.parse(readExample('pinion-kr2231-plan.json'));

/** The pinion request with some fields replaced. */
export const pinionWith = (patch: Record<string, unknown>): Record<string, unknown> => ({
  ...pinionRequest(),
  ...patch,
});

/**
 * The recipe simulated forward at the simulator's default resolution, D scaled by `factor` here
 * (the recipe's own `diffusivityFactor` is set aside, so the check does not lean on that route).
 */
export function forward(recipe: Recipe, factor = 1, resolution = 1): SimulationResult {
  const { diffusivityFactor: _own, ...uncalibrated } = recipe;
  const model = DIFFUSIVITY_MODELS[recipe.model ?? 'agren'].diffusivity;
  return runCycle(uncalibrated, resolution, { diffusivity: (tempK, carbonPct) => factor * model(tempK, carbonPct) });
}

export const within = (value: number, range: { min: number; max: number }) => value >= range.min && value <= range.max;

interface Step {
  temperatureC: number;
  carbonPotentialPct: number;
}

/** A suggestion applied to a copy of the request it was made for; undefined for one that names no new value. */
function applied(request: Record<string, unknown>, suggestion: Warning): Record<string, unknown> | undefined {
  const p = suggestion.params ?? {};
  const boost = request.boost as Step;
  const diffuse = request.diffuse as Step;
  const shift = (deltaC: number) => ({
    ...request,
    boost: { ...boost, temperatureC: boost.temperatureC + deltaC },
    diffuse: { ...diffuse, temperatureC: diffuse.temperatureC + deltaC },
  });
  const potential = (step: 'boost' | 'diffuse', pct: unknown) => ({
    ...request,
    [step]: { ...(request[step] as Step), carbonPotentialPct: pct },
  });
  switch (suggestion.code) {
    case 'plan.raiseTemperature':
      return shift(Number(p.deltaC));
    case 'plan.lowerTemperature':
      return shift(-Number(p.deltaC));
    case 'plan.lowerBoostPotential':
      return potential('boost', p.potentialPct);
    case 'plan.raiseBoostPotential':
      return potential('boost', p.maxPotentialPct);
    case 'plan.lowerDiffusePotential':
    case 'plan.raiseDiffusePotential':
      return potential('diffuse', p.potentialPct);
    case 'plan.allowMoreTime':
      return { ...request, maxTotalH: p.totalH };
    default:
      return undefined;
  }
}

/** The potential of a step at most saturation at its temperature, on this steel (potential × alloy factor where above 1). */
function belowSaturation(plan: PlanRequest, step: 'boost' | 'diffuse'): boolean {
  const factor = plan.steel.composition ? alloyFactor(plan.steel.composition) : 1;
  const tempC =
    step === 'boost'
      ? plan.boost.temperatureC
      : Math.min(plan.diffuse.temperatureC, plan.hardening?.temperatureC ?? Infinity);
  const limitPct = saturationCarbonPct(tempC);
  // No austenite at that temperature (a cold hardening soak): no saturation line to pass.
  return limitPct === undefined || plan[step].carbonPotentialPct * Math.max(1, factor) <= limitPct + 1e-9;
}

/** A suggestion applied is an accepted request, inside the models' range, with the potential it names below saturation. */
export function expectPossible(request: Record<string, unknown>, suggestion: Warning): boolean {
  const changed = applied(request, suggestion);
  if (!changed) return false;
  const read = readPlanRequest(changed);
  expect(read.ok, `${suggestion.code} ${JSON.stringify(suggestion.params)}`).toBe(true);
  if (!read.ok) return false;
  const plan = read.value;
  if (suggestion.code.endsWith('Temperature')) {
    for (const tempC of [plan.boost.temperatureC, plan.diffuse.temperatureC]) {
      expect(tempC).toBeGreaterThanOrEqual(MODEL_CALIBRATED_RANGE.minTempC);
      expect(tempC).toBeLessThanOrEqual(MODEL_CALIBRATED_RANGE.maxTempC);
    }
    const before = readPlanRequest(request);
    if (before.ok && saturationFinding(before.value) === undefined) expect(saturationFinding(plan)).toBeUndefined();
  }
  if (suggestion.code.includes('BoostPotential')) expect(belowSaturation(plan, 'boost')).toBe(true);
  if (suggestion.code.includes('DiffusePotential')) expect(belowSaturation(plan, 'diffuse')).toBe(true);
  return true;
}
