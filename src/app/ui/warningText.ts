/**
 * Words a physics caution or planner finding for the screen. Those whose figures carry a unit
 * (mm, h, °C, %C) are worded from `app.unitWarnings.` with every figure formatted in the user's
 * units and locale; the rest use the physics message as it is (warningMessage).
 */
import type { TFunction } from 'i18next';
import { warningMessage } from '../../i18n/i18n';
import type { Warning, WarningCode } from '../../physics';
import type { Show } from './show';

type Kind = 'depth' | 'time' | 'temperature' | 'temperatureChange' | 'carbon';

const saturation = { carbonPct: 'carbon', limitPct: 'carbon', tempC: 'temperature' } as const;
const potentialSaturation = { potentialPct: 'carbon', limitPct: 'carbon', tempC: 'temperature' } as const;
const surfaceSaturation = { ...potentialSaturation, surfacePct: 'carbon' } as const;
const austeniteLimit = { tempC: 'temperature', limitC: 'temperature' } as const;

/** Warning codes with unit-bearing figures, and the kind of each of their params. */
export const UNIT_WARNINGS: Partial<Record<WarningCode, Readonly<Record<string, Kind>>>> = {
  'saturation.potentialAboveAcm': saturation,
  'saturation.surfaceAboveAcm': saturation,
  'saturation.equilibriumAboveAcm': { ...saturation, potentialPct: 'carbon' },
  'austenite.twoPhaseCore': { tempC: 'temperature', ac3C: 'temperature' },
  'austenite.noneInStep': austeniteLimit,
  'hardening.noAustenite': austeniteLimit,
  'safety.atmosphereBelowSafeTemperature': { tempC: 'temperature', minC: 'temperature' },
  'shape.throughCarburizing': { depthMm: 'depth', limitMm: 'depth' },
  'model.outsideCalibratedRange': { minC: 'temperature', maxC: 'temperature', minPct: 'carbon', maxPct: 'carbon' },
  'plan.boostPotentialAboveSaturation': potentialSaturation,
  'plan.diffusePotentialAboveSaturation': potentialSaturation,
  'plan.boostSurfaceAboveSaturation': surfaceSaturation,
  'plan.diffuseSurfaceAboveSaturation': surfaceSaturation,
  'plan.caseDepthNeedsMoreTime': { targetMm: 'depth', reachedMm: 'depth', maxTotalH: 'time' },
  'plan.caseDepthTooDeepForShortestCycle': { targetMm: 'depth', reachedMm: 'depth', totalH: 'time' },
  'plan.surfaceCarbonTooHighForCycleTime': { targetPct: 'carbon', reachedPct: 'carbon', totalH: 'time' },
  'plan.missedInFinalCheck': { ecdMm: 'depth', surfacePct: 'carbon' },
  'plan.raiseBoostPotential': { maxPotentialPct: 'carbon', limitPct: 'carbon', tempC: 'temperature' },
  'plan.raiseTemperature': { deltaC: 'temperatureChange' },
  'plan.lowerTemperature': { deltaC: 'temperatureChange' },
  'plan.allowMoreTime': { totalH: 'time' },
  'plan.shortenHardening': { timeH: 'time' },
  'hardness.coreAboveCeiling': { carbonPct: 'carbon' },
  'hardness.limitAboveCeilingAtThreshold': { thresholdPct: 'carbon' },
  'traverse.crossedInHv': { depthMm: 'depth' },
  'traverse.neverReachesLimit': { depthMm: 'depth' },
  'plan.outOfReach': { minC: 'temperature', maxC: 'temperature', maxTotalH: 'time' },
};

const FORMAT: Record<Kind, (show: Show, value: number) => string> = {
  depth: (show, mm) => show.depth(mm),
  time: (show, h) => show.time(h),
  temperature: (show, c) => show.temperature(c),
  temperatureChange: (show, c) => show.temperatureDifference(c),
  carbon: (show, pct) => show.carbon(pct),
};

/** The sentence for a warning, figures in the user's units where its message is unit-aware. */
export function wordWarning(t: TFunction, warning: Warning, show: Show): string {
  const kinds = UNIT_WARNINGS[warning.code];
  if (!kinds || !warning.params) return warningMessage(t, warning);
  const params: Record<string, string | number> = { ...warning.params };
  for (const [name, kind] of Object.entries(kinds)) {
    const raw = warning.params[name];
    if (typeof raw === 'number') params[name] = FORMAT[kind](show, raw);
  }
  return t(`app.unitWarnings.${warning.code}`, params);
}

/** A cycle's cautions, each prefixed with its step when it concerns one. */
export function stepCautions(warnings: readonly Warning[], t: TFunction, show: Show): string[] {
  return warnings.map((w) =>
    w.stepIndex === undefined
      ? wordWarning(t, w, show)
      : t('app.cycle.stepCaution', { n: w.stepIndex + 1, message: wordWarning(t, w, show) }),
  );
}
