/**
 * The cycle recipe (`simulate`) and the `plan` request as data (requestSpec.ts): read by
 * readRecipe and readPlanRequest, stored by the job log, laid out by the cycle editor and the planner.
 */
import { LIMITS, MAX_STEPS, TEXT_LENGTH_LIMITS } from '../limits';
import { composition, hardness, list, num, object, text, variant } from '../requestSpec';
import { diffusivityFactor, model, totalCaseMarginPct } from '../requestTables';
import { DEFAULT_ECD_THRESHOLD_PCT } from '../steel';
import { DEFAULT_BETA_M_PER_S } from './recipe';

/** Longest cycle (boost + diffuse + hardening) the planner proposes unless the request says otherwise, h (our choice: beyond the deepest pit-furnace cases, well inside the longest time accepted). */
export const DEFAULT_MAX_TOTAL_H = 100;

export const RECIPE_STEP = object({
  durationH: num(LIMITS.time),
  startTempC: num(LIMITS.stepTemperature),
  endTempC: num(LIMITS.stepTemperature, { defaultFrom: 'startTempC' }),
  /** Required: a number, or null for neutral gas (absent is an error, not a guess). */
  carbonPotentialPct: num(LIMITS.carbon, { nullable: true }),
  betaMPerS: num(LIMITS.beta, { default: DEFAULT_BETA_M_PER_S }),
  label: text(TEXT_LENGTH_LIMITS.label),
});

const SHAPE = variant(
  {
    'semi-infinite': {},
    /** Carburized on both faces. */
    plate: { thicknessMm: num(LIMITS.shapeSize) },
    /** Round bar carburized radially. */
    bar: { diameterMm: num(LIMITS.shapeSize) },
  },
  { default: 'semi-infinite', unknown: 'shape.unknown' },
);

/** Steel, model, ECD threshold, case criterion, shape, furnace factor and name: what a cycle and a plan share. */
const CYCLE_BASE = {
  steel: object({
    coreCarbonPct: num(LIMITS.carbon),
    composition: composition(),
    /** The indicative hardness curve is drawn in HRC: the core must convert. */
    coreHardness: hardness('convertible'),
    grade: text(TEXT_LENGTH_LIMITS.grade),
  }),
  model,
  thresholdCarbonPct: num(LIMITS.carbon, { default: DEFAULT_ECD_THRESHOLD_PCT }),
  /** The hardness the effective case depth stands for; absent: 550 HV (ISO 18203). */
  ecdHardnessLimit: hardness('convertible'),
  shape: SHAPE,
  totalCaseMarginPct,
  diffusivityFactor,
  name: text(TEXT_LENGTH_LIMITS.name),
} as const;

export const RECIPE_REQUEST = {
  ...CYCLE_BASE,
  steps: list(RECIPE_STEP, { min: 1, max: MAX_STEPS, tooFew: 'steps.empty', tooMany: 'steps.tooMany' }),
} as const;

const POTENTIAL_STEP = object({
  temperatureC: num(LIMITS.temperature),
  carbonPotentialPct: num(LIMITS.carbon),
  betaMPerS: num(LIMITS.beta, { default: DEFAULT_BETA_M_PER_S }),
});

const range = (limit: (typeof LIMITS)[keyof typeof LIMITS]) => object({ min: num(limit), max: num(limit) });

export const PLAN_REQUEST = {
  ...CYCLE_BASE,
  boost: POTENTIAL_STEP,
  diffuse: POTENTIAL_STEP,
  /** The soak at hardening temperature before the quench: no austenite there is a caution, not an error. */
  hardening: object({ temperatureC: num(LIMITS.stepTemperature), timeH: num(LIMITS.time) }, { optional: true }),
  targetEcdMm: range(LIMITS.depth),
  targetSurfaceCarbonPct: range(LIMITS.carbon),
  /** Longest total cycle accepted as a plan. */
  maxTotalH: num(LIMITS.time, { default: DEFAULT_MAX_TOTAL_H }),
} as const;
