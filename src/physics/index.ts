/**
 * The physics engine's public surface, the one door for the CLI, the job log and the app (the
 * architecture test refuses deep imports from outside `physics/`). Each name is listed on purpose:
 * a module's new export stays internal until it is named here. Physics' own tests may read
 * internals directly.
 */
export {
  ERROR_CODES,
  WARNING_CODES,
  fail,
  ok,
  type ErrorCode,
  type InputError,
  type Params,
  type Result,
  type Warning,
  type WarningCode,
} from './result';
export { UNITS, convert, convertTemperatureDifference, parseNumber, quantityOf, type TimeUnit } from './units';
export { parseDuration } from './duration';
export { OUTPUT_PRECISION, roundForOutput, type OutputPrecision } from './precision';
export {
  CARBON_DEPENDENCE_POINT,
  DEFAULT_MODEL,
  DIFFUSIVITY_MODELS,
  MODEL_CALIBRATED_RANGE,
  MODEL_IDS,
  carbonDependence,
  isModelId,
  modelSpread,
  type DiffusivityModelId,
} from './diffusivity';
export {
  ALLOY_ELEMENTS,
  ALLOY_ELEMENT_MAX_PCT,
  DEFAULT_ECD_THRESHOLD_PCT,
  EUTECTOID_TEMP_C,
  MAX_CARBON_PCT,
  TOTAL_CASE_MARGIN_PCT,
  type Composition,
} from './steel';
export { STEEL_GRADES, findGrade, findGradeByIdOrName } from './grades';
export {
  CASE_CRITERIA,
  CASE_CRITERION_IDS,
  DEFAULT_CASE_CRITERION,
  CONVERTIBLE_RANGE as CONVERTIBLE_HARDNESS_RANGE,
  HARDNESS_SCALE_RANGE,
  HARDNESS_UNITS,
  hardnessIn,
  hrcToHv,
  hvToHrc,
  isCaseCriterionId,
  isHardnessUnit,
  type CaseCriterionId,
  type Hardness,
  type HardnessUnit,
} from './hardness';
export { checkHardness } from './readHardness';
export { type IndicativeHardnessBasis } from './indicativeHardness';
export { readTraverse, type TraversePoint, type TraverseRequest } from './traverse/readTraverse';
export { CORE_RULE, analyseTraverse, traverse, type TraverseResult } from './traverse/traverse';
export { CASE_END_FRACTION, caseEndDepthMm } from './traverse/caseEnd';
export {
  APPROXIMATIONS,
  type Approximation,
  type ApproximationEffect,
  type ApproximationUnit,
  type ApproximationValue,
} from './approximations';
export {
  DIFFUSIVITY_FACTOR_LIMITS,
  MAX_DEPTH_MM,
  MAX_TEMPERATURE_TOLERANCE_C,
  MAX_TOTAL_CASE_MARGIN_PCT,
  checkBeta,
  checkCarbonPct,
  checkDepthMm,
  checkTemperatureC,
  checkTemperatureTolerance,
  checkTimeH,
  checkTotalCaseMargin,
} from './validate';
export {
  caseDepth,
  depthFigures,
  readCaseSpec,
  temperatureForCaseDepth,
  timeForCaseDepth,
  type CaseDepthResult,
  type TemperatureResult,
  type TimeResult,
} from './caseDepth';
export { equivalentTime, type EquivalentTimeResult } from './equivalentTime';
export { convertRequest, type ConversionResult } from './conversions';
export { DEFAULT_BETA_RANGE_M_PER_S, DEFAULT_TEMPERATURE_TOLERANCE_C, type DepthBand, type Range } from './uncertainty';
export { fitDiffusivityFactor, type CalibrationFit, type CalibrationSample } from './calibration';
export {
  MIN_THRESHOLD_LOADS,
  fitPlantThreshold,
  type PlantThresholdFit,
  type ThresholdResidual,
  type ThresholdSample,
} from './plantThreshold';
export { planTwoStepCycle, type PlanResult } from './planner/planner';
export {
  DEFAULT_BETA_M_PER_S,
  type PartShape,
  type ProfilePoint,
  type Recipe,
  type RecipeStep,
  type SimulationResult,
} from './cycle/recipe';
export { readRecipe } from './cycle/readRecipe';
export { LIMITS, MAX_STEPS, TEXT_LENGTH_LIMITS, checkLimit, withinLimit, type Limit, type ValueUnit } from './limits';
export {
  readRequest,
  specAt,
  type FieldSpec,
  type FieldsSpec,
  type NumberSpec,
  type ReadOf,
  type RequestOf,
} from './requestSpec';
export {
  CONVERT_REQUEST,
  DEPTH_REQUEST,
  EQUIVALENT_TIME_REQUEST,
  PLAN_REQUEST,
  RECIPE_REQUEST,
  REQUESTS,
  TEMPERATURE_REQUEST,
  TIME_REQUEST,
} from './requestTables';
export { runCycle, simulateCycle } from './cycle/simulate';
export { cycleDepthBand, type CycleBand, type CycleBandOptions } from './cycle/band';
/** Reproducible pseudo-random numbers, for synthetic data (the demo log), never for anything secret. */
export { mulberry32 } from './random';
