/**
 * Cautions for a simulated cycle, each tied to the recipe step it concerns. They reuse
 * the shared cautions so the calculators and the simulator say the same thing.
 */
import {
  atmosphereTemperatureWarning,
  modelRangeWarning,
  retainedAusteniteWarning,
  saturationWarnings,
  SAFE_ATMOSPHERE_MIN_TEMP_C,
} from '../cautions';
import { EUTECTOID_TEMP_C } from '../equivalentTime';
import type { Warning } from '../result';
import { saturationCarbonPct } from '../steel';
import { kelvinToCelsius } from '../units';
import type { PartShape, Recipe } from './recipe';
import type { SolverRun } from './solver';

/** A case deeper than this share of the plate thickness or bar radius risks through-carburizing (common practice). */
export const THROUGH_CARBURIZING_SHARE = 1 / 3;

const tag = (warnings: Warning[], stepIndex: number) => warnings.map((w) => ({ ...w, stepIndex }));

/** The worst point of a step where surface carbon exceeds saturation at the furnace temperature then. */
function surfaceSaturation(run: SolverRun, stepIndex: number): Warning[] {
  let worstExcess = 0;
  let worst = -1;
  for (let i = 1; i < run.historyLength; i++) {
    if (run.historyStep[i] !== stepIndex) continue;
    const limit = saturationCarbonPct(kelvinToCelsius(run.historyTempK[i]!));
    const excess = limit === undefined ? 0 : run.historySurfacePct[i]! - limit;
    if (excess > worstExcess) {
      worstExcess = excess;
      worst = i;
    }
  }
  return worst < 0 ? [] : saturationWarnings(kelvinToCelsius(run.historyTempK[worst]!), run.historySurfacePct[worst]!);
}

function highestSurfacePct(run: SolverRun, stepIndex: number): number {
  let highest = 0;
  for (let i = 1; i < run.historyLength; i++) {
    if (run.historyStep[i] === stepIndex) highest = Math.max(highest, run.historySurfacePct[i]!);
  }
  return highest;
}

function stepWarnings(recipe: Recipe, run: SolverRun, stepIndex: number): Warning[] {
  const step = recipe.steps[stepIndex]!;
  const lowC = Math.min(step.startTempC, step.endTempC);
  const highC = Math.max(step.startTempC, step.endTempC);
  const warnings: Warning[] = [];
  const potentialPct = step.carbonPotentialPct;
  if (potentialPct !== null && lowC < SAFE_ATMOSPHERE_MIN_TEMP_C) warnings.push(...atmosphereTemperatureWarning(lowC));
  if (highC <= EUTECTOID_TEMP_C) return tag(warnings, stepIndex);
  if (potentialPct !== null) {
    // The atmosphere is richest relative to saturation at the coolest austenite temperature of the step.
    warnings.push(...saturationWarnings(Math.max(lowC, EUTECTOID_TEMP_C), 0, potentialPct));
  }
  warnings.push(...surfaceSaturation(run, stepIndex), ...modelRangeWarning(highC, highestSurfacePct(run, stepIndex)));
  return tag(warnings, stepIndex);
}

/** A case deeper than a third of the plate thickness or the bar radius. */
export function throughCarburizingWarning(shape: PartShape, totalCaseDepthMm: number): Warning[] {
  const limitMm = shape.kind === 'plate' ? shape.thicknessMm : shape.kind === 'bar' ? shape.diameterMm / 2 : undefined;
  if (limitMm === undefined || !(totalCaseDepthMm > limitMm * THROUGH_CARBURIZING_SHARE)) return [];
  return [{ code: 'shape.throughCarburizing', params: { depthMm: Number(totalCaseDepthMm.toFixed(2)), limitMm } }];
}

export function cycleWarnings(recipe: Recipe, run: SolverRun, totalCaseDepthMm: number): Warning[] {
  return [
    ...recipe.steps.flatMap((_, i) => stepWarnings(recipe, run, i)),
    ...retainedAusteniteWarning(run.surfaceCarbonPct),
    ...throughCarburizingWarning(recipe.shape ?? { kind: 'semi-infinite' }, totalCaseDepthMm),
  ];
}
