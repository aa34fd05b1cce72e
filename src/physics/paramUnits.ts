/**
 * The unit of every figure an error or a warning carries, so whoever words it (the CLI in °C, mm
 * and h; the app in the user's units and locale) formats each figure with its unit and the
 * message itself holds none. A range error's `value`, `min` and `max` are in its limit's unit
 * (limits.ts); a code used by several limits has one unit (a test checks it).
 */
import { LIMITS, type ValueUnit } from './limits';
import { specAt } from './requestSpec';
import { REQUESTS } from './requestTables';
import type { ErrorCode, WarningCode } from './result';

export type ParamUnits = Readonly<Record<string, ValueUnit>>;

const rangeUnits = (unit: ValueUnit): ParamUnits => ({ value: unit, min: unit, max: unit });

/** Each limit's codes take its unit for `value`, `min` and `max`. */
const FROM_LIMITS: Partial<Record<ErrorCode, ParamUnits>> = Object.fromEntries(
  Object.values(LIMITS).flatMap((limit) => [
    [limit.below, rangeUnits(limit.unit)],
    [limit.above, rangeUnits(limit.unit)],
  ]),
);

const carbon = (...names: string[]): ParamUnits => Object.fromEntries(names.map((n) => [n, '%C' as const]));

export const ERROR_PARAM_UNITS: Partial<Record<ErrorCode, ParamUnits>> = {
  ...FROM_LIMITS,
  'time.limitTooShort': { value: 'h', min: 'h' },
  'carbon.surfaceNotAboveCore': carbon('surfacePct', 'corePct'),
  'carbon.boostNotAboveDiffuse': carbon('boostPct', 'diffusePct'),
  'threshold.outsideProfile': carbon('thresholdPct', 'corePct', 'surfacePct'),
  'threshold.notAboveCore': carbon('thresholdPct', 'corePct'),
  'solve.temperatureBelowRange': { minC: 'C', maxC: 'C' },
  'solve.temperatureAboveRange': { minC: 'C', maxC: 'C' },
  'traverse.depthNegative': { value: 'mm' },
  'traverse.depthRepeated': { value: 'mm' },
  'traverse.depthNotIncreasing': { value: 'mm', previous: 'mm' },
  'plantThreshold.outOfRange': carbon('minPct', 'maxPct'),
};

const saturation: ParamUnits = { carbonPct: '%C', limitPct: '%C', tempC: 'C' };
const potentialSaturation: ParamUnits = { potentialPct: '%C', limitPct: '%C', tempC: 'C' };
const surfaceSaturation: ParamUnits = { ...potentialSaturation, surfacePct: '%C' };
const austeniteLimit: ParamUnits = { tempC: 'C', limitC: 'C' };

export const WARNING_PARAM_UNITS: Partial<Record<WarningCode, ParamUnits>> = {
  'saturation.potentialAboveAcm': saturation,
  'saturation.surfaceAboveAcm': saturation,
  'saturation.equilibriumAboveAcm': { ...saturation, potentialPct: '%C' },
  'austenite.twoPhaseCore': { tempC: 'C', ac3C: 'C' },
  'austenite.noneInStep': austeniteLimit,
  'hardening.noAustenite': austeniteLimit,
  'safety.atmosphereBelowSafeTemperature': { tempC: 'C', minC: 'C' },
  'shape.throughCarburizing': { depthMm: 'mm', limitMm: 'mm' },
  'hardness.retainedAustenite': carbon('carbonPct', 'limitPct'),
  'hardness.coreAboveCeiling': carbon('carbonPct'),
  'hardness.limitAboveCeilingAtThreshold': carbon('thresholdPct'),
  'model.outsideCalibratedRange': { minC: 'C', maxC: 'C', minPct: '%C', maxPct: '%C' },
  'traverse.crossedInHv': { depthMm: 'mm' },
  'traverse.neverReachesLimit': { depthMm: 'mm' },
  'plan.boostPotentialAboveSaturation': potentialSaturation,
  'plan.diffusePotentialAboveSaturation': potentialSaturation,
  'plan.boostSurfaceAboveSaturation': surfaceSaturation,
  'plan.diffuseSurfaceAboveSaturation': surfaceSaturation,
  'plan.caseDepthNeedsMoreTime': { targetMm: 'mm', reachedMm: 'mm', maxTotalH: 'h' },
  'plan.caseDepthTooDeepForShortestCycle': { targetMm: 'mm', reachedMm: 'mm', totalH: 'h' },
  'plan.surfaceCarbonTooHighForDiffusePotential': carbon('targetPct', 'potentialPct', 'equilibriumPct', 'reachedPct'),
  'plan.surfaceCarbonTooHighForCycleTime': { ...carbon('targetPct', 'reachedPct'), totalH: 'h' },
  'plan.surfaceCarbonTooLowForDiffusePotential': carbon('targetPct', 'potentialPct', 'reachedPct'),
  'plan.missedInFinalCheck': { ecdMm: 'mm', surfacePct: '%C' },
  'plan.lowerBoostPotential': carbon('potentialPct'),
  'plan.raiseBoostPotential': { ...carbon('maxPotentialPct', 'limitPct'), tempC: 'C' },
  'plan.lowerDiffusePotential': carbon('potentialPct'),
  'plan.raiseDiffusePotential': carbon('potentialPct'),
  'plan.raiseTemperature': { deltaC: 'dC' },
  'plan.lowerTemperature': { deltaC: 'dC' },
  'plan.allowMoreTime': { totalH: 'h' },
  'plan.shortenHardening': { timeH: 'h' },
  'plan.outOfReach': { minC: 'C', maxC: 'C', maxTotalH: 'h' },
};

/** The unit of the number at a request path in any request (`targetEcdMm.max` → mm), if one has it. */
function unitAtPath(path: string): ValueUnit | undefined {
  for (const spec of Object.values(REQUESTS)) {
    const field = specAt(spec, path);
    if (field?.type === 'number' && field.limit) return field.limit.unit;
  }
  return undefined;
}

/**
 * The units of an error's figures: by its code, else (a range error of no one unit, such as
 * `range.minAboveMax`) `value`, `min` and `max` in the unit of the field it names.
 */
export function errorParamUnits(code: ErrorCode, field?: string): ParamUnits {
  const byCode = ERROR_PARAM_UNITS[code];
  if (byCode) return byCode;
  const unit = field === undefined ? undefined : unitAtPath(field);
  return unit ? rangeUnits(unit) : {};
}

export const warningParamUnits = (code: WarningCode): ParamUnits => WARNING_PARAM_UNITS[code] ?? {};
