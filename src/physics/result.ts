/**
 * Typed results for everything that can receive user input.
 *
 * The physics layer never throws on user input: it returns `{ ok: false, error }`
 * where `error.code` is also the translation key under `errors.` in every locale,
 * and `params` fills the placeholders of that message.
 */

/** Every error code the physics layer can return (each is a key under `errors.` in the locales). */
export const ERROR_CODES = [
  'number.empty',
  'number.invalid',
  'duration.invalid',
  'field.missing',
  'field.notNumber',
  'request.notObject',
  'time.notPositive',
  'time.tooLong',
  'temperature.outOfRange',
  'temperature.noAustenite',
  'temperature.belowAbsoluteZero',
  'carbon.negative',
  'carbon.aboveMax',
  'carbon.surfaceNotAboveCore',
  'threshold.outsideProfile',
  'depth.notPositive',
  'depth.tooDeep',
  'model.unknown',
  'composition.outOfRange',
  'composition.notObject',
  'composition.unknownElement',
  'beta.notPositive',
  'diffusivityFactor.outOfRange',
  'temperatureTolerance.outOfRange',
  'totalCaseMargin.outOfRange',
  'solve.temperatureBelowRange',
  'solve.temperatureAboveRange',
  'solve.noConvergence',
  'unit.unknown',
  'quantity.unknown',
  'hardness.outOfTable',
  'hardness.notObject',
  'hardness.unknownUnit',
  'hardness.outsideScale',
  'hardness.outsideScaleOtherUnit',
  'hardness.coreNotBelowLimit',
  'traverse.tooFewPoints',
  'traverse.tooManyPoints',
  'traverse.pointNotObject',
  'traverse.depthNegative',
  'traverse.depthRepeated',
  'traverse.depthNotIncreasing',
  'history.tooShort',
  'history.notIncreasing',
  'history.temperatureTooHigh',
  'calibration.tooFewJobs',
  'calibration.noSensitivity',
  'calibration.factorOutOfRange',
  'plantThreshold.tooFewLoads',
  'plantThreshold.notIdentifiable',
  'plantThreshold.factorOutOfRange',
  'plantThreshold.outOfRange',
  'steps.empty',
  'steps.tooMany',
  'shape.unknown',
  'shape.sizeOutOfRange',
  'threshold.notAboveCore',
  'range.minAboveMax',
  'carbon.boostNotAboveDiffuse',
  'time.limitTooShort',
  'text.tooLong',
] as const;

export type ErrorCode = (typeof ERROR_CODES)[number];

export type Params = Record<string, number | string>;

export interface InputError {
  /** Translation key under `errors.`; stable, part of the CLI's JSON output. */
  code: ErrorCode;
  /** Request field that caused it, when there is one (e.g. `timeH`). */
  field?: string;
  /** Values for the message placeholders. */
  params?: Params;
}

export type Result<T> = { ok: true; value: T } | { ok: false; error: InputError };

export const ok = <T>(value: T): Result<T> => ({ ok: true, value });

export const fail = <T = never>(code: ErrorCode, field?: string, params?: Params): Result<T> => ({
  ok: false,
  error: {
    code,
    ...(field === undefined ? {} : { field }),
    ...(params === undefined ? {} : { params }),
  },
});

/** Cautions that do not stop a computation, and the planner's findings (each is a key under `warnings.` in the locales). */
export const WARNING_CODES = [
  'saturation.potentialAboveAcm',
  'saturation.surfaceAboveAcm',
  'saturation.equilibriumAboveAcm',
  'austenite.twoPhaseCore',
  'austenite.noneInStep',
  'hardening.noAustenite',
  'safety.atmosphereBelowSafeTemperature',
  'shape.throughCarburizing',
  'hardness.retainedAustenite',
  'hardness.coreAboveCeiling',
  'hardness.limitAboveCeilingAtThreshold',
  // What a hardness traverse says about itself.
  'traverse.convertedApproximately',
  'traverse.crossedInHv',
  'traverse.startsBelowLimit',
  'traverse.neverReachesLimit',
  'traverse.multipleCrossings',
  'traverse.coreNotReached',
  'traverse.coreNotLevelled',
  'model.outsideCalibratedRange',
  // What binds when the planner cannot meet its targets…
  'plan.boostPotentialAboveSaturation',
  'plan.diffusePotentialAboveSaturation',
  'plan.boostSurfaceAboveSaturation',
  'plan.diffuseSurfaceAboveSaturation',
  'plan.caseDepthNeedsMoreTime',
  'plan.caseDepthTooDeepForShortestCycle',
  'plan.surfaceCarbonTooHighForDiffusePotential',
  'plan.surfaceCarbonTooHighForCycleTime',
  'plan.surfaceCarbonTooLowForDiffusePotential',
  'plan.missedInFinalCheck',
  // …and what would make them reachable.
  'plan.lowerBoostPotential',
  'plan.raiseBoostPotential',
  'plan.lowerDiffusePotential',
  'plan.raiseDiffusePotential',
  'plan.raiseTemperature',
  'plan.lowerTemperature',
  'plan.allowMoreTime',
  'plan.shortenHardening',
  // …or that nothing within the models' range and the accepted inputs does.
  'plan.outOfReach',
] as const;

export type WarningCode = (typeof WARNING_CODES)[number];

export interface Warning {
  code: WarningCode;
  params?: Params;
  /** Index of the recipe step it concerns, for cycle results. */
  stepIndex?: number;
}
