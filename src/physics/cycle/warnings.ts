/**
 * Cautions for a simulated cycle, each tied to the recipe step it concerns. They reuse
 * the shared cautions so the calculators and the simulator say the same thing.
 */
import {
  atmosphereTemperatureWarning,
  equilibriumSaturationWarning,
  modelRangeWarning,
  retainedAusteniteWarning,
  saturationWarnings,
  SAFE_ATMOSPHERE_MIN_TEMP_C,
  twoPhaseCoreWarning,
} from '../cautions';
import type { Warning } from '../result';
import { alloyFactor, EUTECTOID_TEMP_C, hasAustenite, saturationCarbonPct } from '../steel';
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
  const { steel } = recipe;
  const lowC = Math.min(step.startTempC, step.endTempC);
  const highC = Math.max(step.startTempC, step.endTempC);
  const warnings: Warning[] = [];
  const potentialPct = step.carbonPotentialPct;
  if (potentialPct !== null && lowC < SAFE_ATMOSPHERE_MIN_TEMP_C) warnings.push(...atmosphereTemperatureWarning(lowC));
  if (!hasAustenite(highC)) {
    if (potentialPct !== null) {
      warnings.push({ code: 'austenite.noneInStep', params: { tempC: highC, limitC: EUTECTOID_TEMP_C } });
    }
    return tag(warnings, stepIndex);
  }
  const surface = surfaceSaturation(run, stepIndex);
  if (potentialPct !== null) {
    // The atmosphere is richest relative to saturation at the coolest austenite temperature of the step.
    const coolestC = Math.max(lowC, EUTECTOID_TEMP_C);
    warnings.push(...saturationWarnings(coolestC, 0, potentialPct));
    const factor = steel.composition ? alloyFactor(steel.composition) : 1;
    if (surface.length === 0) warnings.push(...equilibriumSaturationWarning(coolestC, potentialPct, factor));
    // Only a step that stays below Ac3 carburizes a two-phase core; a heat-up passes through it.
    warnings.push(...twoPhaseCoreWarning(highC, steel.coreCarbonPct, steel.composition));
  }
  warnings.push(...surface, ...modelRangeWarning(highC, highestSurfacePct(run, stepIndex)));
  return tag(warnings, stepIndex);
}

/** The last step is the one quenched from: at or below A1 there is no austenite to harden. */
function hardeningWarning(recipe: Recipe): Warning[] {
  const lastIndex = recipe.steps.length - 1;
  const endC = recipe.steps[lastIndex]?.endTempC;
  if (endC === undefined || hasAustenite(endC)) return [];
  return [{ code: 'hardening.noAustenite', params: { tempC: endC, limitC: EUTECTOID_TEMP_C }, stepIndex: lastIndex }];
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
    ...hardeningWarning(recipe),
    ...retainedAusteniteWarning(run.surfaceCarbonPct),
    ...throughCarburizingWarning(recipe.shape ?? { kind: 'semi-infinite' }, totalCaseDepthMm),
  ];
}
